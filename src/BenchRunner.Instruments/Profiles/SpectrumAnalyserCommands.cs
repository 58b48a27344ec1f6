namespace BenchRunner.Instruments.Profiles;

/// <summary>A profile's spectrum analyser commands (<c>spectrum-analyser:</c>).</summary>
public sealed class SpectrumAnalyserCommands
{
    internal SpectrumAnalyserCommands(IReadOnlyList<CommandTemplate> setup, IReadOnlyList<CommandTemplate> sweep, CommandTemplate read,
        ReplyGrammar data, int? defaultPoints)
    {
        Setup = setup;
        Sweep = sweep;
        Read = read;
        Data = data;
        DefaultPoints = defaultPoints;
    }

    /// <summary>Sent in order to set span, RBW, input attenuation, reference level and points.</summary>
    public IReadOnlyList<CommandTemplate> Setup { get; }

    /// <summary>Sent in order to make one sweep and wait for its end; empty when reading the trace sweeps.</summary>
    public IReadOnlyList<CommandTemplate> Sweep { get; }

    /// <summary>The command that reads the power trace.</summary>
    public CommandTemplate Read { get; }

    /// <summary>How the trace comes back.</summary>
    public ReplyGrammar Data { get; }

    /// <summary>The number of trace points when the settings give none; null when it is whatever the device sends.</summary>
    public int? DefaultPoints { get; }
}
