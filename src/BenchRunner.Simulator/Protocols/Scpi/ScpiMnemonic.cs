namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>One keyword of a received header: its letters in upper case and its numeric suffix, if written.</summary>
/// <param name="Name">The keyword without its suffix, in upper case, e.g. <c>WINDOW</c>.</param>
/// <param name="Suffix">The numeric suffix written after it, e.g. 2 for <c>WIND2</c>; null when none was written (which means 1).</param>
internal readonly record struct ScpiMnemonic(string Name, int? Suffix);
