namespace BenchRunner.Core.TraceFiles;

/// <summary>The unit of the frequencies in a Touchstone file (the option line's unit word).</summary>
public enum TouchstoneFrequencyUnit
{
    /// <summary><c>Hz</c>.</summary>
    Hertz,

    /// <summary><c>kHz</c>.</summary>
    Kilohertz,

    /// <summary><c>MHz</c>.</summary>
    Megahertz,

    /// <summary><c>GHz</c>: the Touchstone default.</summary>
    Gigahertz,
}
