namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>The unit of a numeric parameter, which decides the suffixes it accepts (IEEE 488.2 §7.7.3).</summary>
public enum ScpiUnit
{
    /// <summary>A plain number (a count of points or sweeps): no suffix is allowed.</summary>
    None,

    /// <summary>Hertz: <c>HZ</c> with a multiplier (<c>KHZ</c>, <c>MHZ</c> = mega, <c>MAHZ</c>, <c>GHZ</c>, ...).</summary>
    Hertz,

    /// <summary>Decibels: <c>DB</c>.</summary>
    Decibel,

    /// <summary>Decibels relative to 1 mW: <c>DBM</c>.</summary>
    DecibelMilliwatt,
}
