namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>The kinds of program data a parameter can be (IEEE 488.2 §7.7).</summary>
public enum ScpiParameterKind
{
    /// <summary>Decimal numeric program data, with an optional suffix: <c>137.5MHZ</c>, <c>-20 DBM</c>, <c>1e6</c>.</summary>
    Numeric,

    /// <summary>Character program data, a word: <c>ON</c>, <c>ASCii</c>, <c>MAX</c>, <c>S21</c>.</summary>
    Character,

    /// <summary>String program data in single or double quotes, a doubled quote standing for one.</summary>
    String,
}
