namespace BenchRunner.Instruments.Profiles;

/// <summary>The kinds of instrument a driver profile can describe; each has its own section of commands.</summary>
public enum InstrumentKind
{
    /// <summary>A vector network analyser (<c>network-analyser</c>).</summary>
    NetworkAnalyser,

    /// <summary>A spectrum analyser (<c>spectrum-analyser</c>).</summary>
    SpectrumAnalyser,

    /// <summary>A signal generator (<c>signal-generator</c>).</summary>
    SignalGenerator,
}
