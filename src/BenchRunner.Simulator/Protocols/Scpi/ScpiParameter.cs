namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>One parameter of a program message unit, as received.</summary>
/// <param name="Kind">Numeric, character or string data.</param>
/// <param name="Text">The parameter as received, trimmed.</param>
/// <param name="Number">The number without its suffix (numeric data only; may be infinite when it overflows).</param>
/// <param name="Suffix">The suffix in upper case (numeric data only), or null when none was given.</param>
/// <param name="Word">The word in upper case (character data), or the unquoted text (string data); empty for numeric data.</param>
public readonly record struct ScpiParameter(ScpiParameterKind Kind, string Text, double Number, string? Suffix, string Word);
