using BenchRunner.Core.Traces;

namespace BenchRunner.Instruments.Profiles;

/// <summary>A profile's network analyser commands (<c>network-analyser:</c>).</summary>
public sealed class NetworkAnalyserCommands
{
    internal NetworkAnalyserCommands(IReadOnlyList<CommandTemplate> setup, CommandTemplate? ifBandwidth, CommandTemplate? averages,
        IReadOnlyList<CommandTemplate> sweep, IReadOnlyDictionary<TraceQuantity, CommandTemplate> read, ReplyGrammar data)
    {
        Setup = setup;
        IfBandwidth = ifBandwidth;
        Averages = averages;
        Sweep = sweep;
        Read = read;
        Data = data;
    }

    /// <summary>Sent in order to set start, stop (or centre, span) and points.</summary>
    public IReadOnlyList<CommandTemplate> Setup { get; }

    /// <summary>Sets the IF bandwidth when a sweep asks for one; null when the instrument has none to set.</summary>
    public CommandTemplate? IfBandwidth { get; }

    /// <summary>Sets the averaging when a sweep asks for it; null when the instrument cannot average.</summary>
    public CommandTemplate? Averages { get; }

    /// <summary>Sent in order to make one sweep and wait for its end; empty when reading the data sweeps.</summary>
    public IReadOnlyList<CommandTemplate> Sweep { get; }

    /// <summary>The command that reads each S-parameter the instrument measures.</summary>
    public IReadOnlyDictionary<TraceQuantity, CommandTemplate> Read { get; }

    /// <summary>How the data of a read command comes back.</summary>
    public ReplyGrammar Data { get; }
}
