using BenchRunner.Core.Diagnostics;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Framing;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// A driver profile: the whole line-based dialect of a serial instrument as data — framing,
/// timing, identity, limits, error replies, and per capability the command templates and the
/// reply grammar (format in <c>docs/profile-format.md</c>). <see cref="ProfileInstrument"/> speaks it.
/// </summary>
public sealed class DriverProfile
{
    internal DriverProfile(string name, string? description, string adapter, IReadOnlyList<InstrumentKind> kinds,
        FramingOptions framing, string? acknowledgement, ProfileTiming timing, IdentityRule identity, InstrumentLimits limits,
        ErrorReplyRule? errorReply, BoolWords boolWords, IReadOnlyList<CommandTemplate> onConnect,
        NetworkAnalyserCommands? networkAnalyser, SpectrumAnalyserCommands? spectrumAnalyser, SignalGeneratorCommands? signalGenerator)
    {
        Name = name;
        Description = description;
        Adapter = adapter;
        Kinds = kinds;
        Framing = framing;
        Acknowledgement = acknowledgement;
        Timing = timing;
        Identity = identity;
        Limits = limits;
        ErrorReply = errorReply;
        BoolWords = boolWords;
        OnConnect = onConnect;
        NetworkAnalyser = networkAnalyser;
        SpectrumAnalyser = spectrumAnalyser;
        SignalGenerator = signalGenerator;
    }

    /// <summary>The adapter of every profile read today: a raw line dialect.</summary>
    public const string RawAdapter = "raw";

    /// <summary>The profile's name (<c>profile:</c>).</summary>
    public string Name { get; }

    /// <summary>Free text, or null.</summary>
    public string? Description { get; }

    /// <summary>The adapter that speaks the profile: <see cref="RawAdapter"/>.</summary>
    public string Adapter { get; }

    /// <summary>What the instrument is, in the order written; each kind has its section.</summary>
    public IReadOnlyList<InstrumentKind> Kinds { get; }

    /// <summary>Terminators, prompt, echo and message size.</summary>
    public FramingOptions Framing { get; }

    /// <summary>The line the device sends after a setting it accepted (e.g. <c>ok</c>), or null when it sends nothing.</summary>
    public string? Acknowledgement { get; }

    /// <summary>Timeouts and settle delays.</summary>
    public ProfileTiming Timing { get; }

    /// <summary>How the identity is learnt.</summary>
    public IdentityRule Identity { get; }

    /// <summary>The declared limits.</summary>
    public InstrumentLimits Limits { get; }

    /// <summary>How an error reply is recognised, or null when the device reports none.</summary>
    public ErrorReplyRule? ErrorReply { get; }

    /// <summary>The words written for a switch placeholder.</summary>
    public BoolWords BoolWords { get; }

    /// <summary>Commands sent after the identity at each connection, to bring the device to a known state.</summary>
    public IReadOnlyList<CommandTemplate> OnConnect { get; }

    /// <summary>The network analyser commands, or null when not a network analyser.</summary>
    public NetworkAnalyserCommands? NetworkAnalyser { get; }

    /// <summary>The spectrum analyser commands, or null when not a spectrum analyser.</summary>
    public SpectrumAnalyserCommands? SpectrumAnalyser { get; }

    /// <summary>The signal generator commands, or null when not a signal generator.</summary>
    public SignalGeneratorCommands? SignalGenerator { get; }

    /// <summary>Reads the profile file at <paramref name="path"/>; messages name the path as given.</summary>
    /// <exception cref="InputFormatException">The file is not a valid profile; it holds every problem found.</exception>
    /// <exception cref="IOException">The file cannot be read.</exception>
    public static DriverProfile Load(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        return Parse(File.ReadAllText(path), path);
    }

    /// <summary>Parses profile text. All problems found are reported together in one exception.</summary>
    /// <param name="text">The file's content.</param>
    /// <param name="sourceName">The name used in messages, usually the file's path.</param>
    /// <exception cref="InputFormatException">The text is not a valid profile.</exception>
    public static DriverProfile Parse(string text, string sourceName)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(sourceName);
        return DriverProfileReader.Read(text, sourceName);
    }
}
