using BenchRunner.Core.Diagnostics;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// A driver profile (format in <c>docs/profile-format.md</c>). With <c>adapter: raw</c> it holds the
/// whole line-based dialect of a serial instrument as data — framing, timing, identity, limits,
/// error replies, and per capability the command templates and the reply grammar — and
/// <see cref="ProfileInstrument"/> speaks it. With <c>adapter: scpi</c> it holds a
/// <see cref="ScpiCommandSet"/> and <see cref="ScpiInstrumentOptions"/> for a
/// <see cref="ScpiInstrument"/>. <see cref="Adapters.InstrumentAdapterFactory"/> builds either.
/// </summary>
public sealed class DriverProfile
{
    private DriverProfile(string name, string? description, AdapterKind adapter, IReadOnlyList<InstrumentKind> kinds,
        FramingOptions framing, ProfileTiming timing, InstrumentLimits limits)
    {
        Name = name;
        Description = description;
        AdapterKind = adapter;
        Adapter = AdapterKindWords.InProfile(adapter);
        Kinds = kinds;
        Framing = framing;
        Timing = timing;
        Limits = limits;
    }

    /// <summary>The profile's name (<c>profile:</c>).</summary>
    public string Name { get; }

    /// <summary>Free text, or null.</summary>
    public string? Description { get; }

    /// <summary>The adapter that speaks the profile, as written: <c>raw</c> or <c>scpi</c> (<see cref="AdapterKindWords.InProfiles"/>).</summary>
    public string Adapter { get; }

    /// <summary>The adapter that speaks the profile.</summary>
    public AdapterKind AdapterKind { get; }

    /// <summary>What the instrument is, in the order written; each kind has its section.</summary>
    public IReadOnlyList<InstrumentKind> Kinds { get; }

    /// <summary>Terminators, prompt, echo and message size (a scpi profile has no prompt and no echo).</summary>
    public FramingOptions Framing { get; }

    /// <summary>
    /// Timeouts and settle delays. For a scpi profile the command timeout is the session's
    /// <see cref="ScpiSessionOptions.CommandTimeout"/>, the sweep timeout its
    /// <see cref="ScpiSessionOptions.CompletionTimeout"/>, and there are no settle delays.
    /// </summary>
    public ProfileTiming Timing { get; }

    /// <summary>The declared limits.</summary>
    public InstrumentLimits Limits { get; }

    /// <summary>Raw: the line the device sends after a setting it accepted (e.g. <c>ok</c>), or null when it sends nothing.</summary>
    public string? Acknowledgement { get; private init; }

    /// <summary>Raw: how the identity is learnt. Null for a scpi profile, whose instrument answers <c>*IDN?</c>.</summary>
    public IdentityRule? Identity { get; private init; }

    /// <summary>Raw: how an error reply is recognised, or null when the device reports none (and for a scpi profile).</summary>
    public ErrorReplyRule? ErrorReply { get; private init; }

    /// <summary>Raw: the words written for a switch placeholder (the default <c>on</c>/<c>off</c> for a scpi profile, which sends ON and OFF).</summary>
    public BoolWords BoolWords { get; private init; } = BoolWords.Default;

    /// <summary>Raw: commands sent after the identity at each connection, to bring the device to a known state (none for a scpi profile).</summary>
    public IReadOnlyList<CommandTemplate> OnConnect { get; private init; } = [];

    /// <summary>
    /// Raw: each kind's section as its <see cref="InstrumentKind"/> read it (e.g. <see cref="NetworkAnalyserCommands"/>),
    /// in the order of <see cref="Kinds"/>; empty for a scpi profile.
    /// </summary>
    public IReadOnlyDictionary<InstrumentKind, object> Sections { get; private init; } = new Dictionary<InstrumentKind, object>();

    /// <summary>Raw: the network analyser commands, or null when not a network analyser (and for a scpi profile).</summary>
    public NetworkAnalyserCommands? NetworkAnalyser => SectionOf<NetworkAnalyserCommands>(InstrumentKind.NetworkAnalyser);

    /// <summary>Raw: the spectrum analyser commands, or null when not a spectrum analyser (and for a scpi profile).</summary>
    public SpectrumAnalyserCommands? SpectrumAnalyser => SectionOf<SpectrumAnalyserCommands>(InstrumentKind.SpectrumAnalyser);

    /// <summary>Raw: the signal generator commands, or null when not a signal generator (and for a scpi profile).</summary>
    public SignalGeneratorCommands? SignalGenerator => SectionOf<SignalGeneratorCommands>(InstrumentKind.SignalGenerator);

    /// <summary>
    /// Scpi: the command set, with a section enabled for each kind listed and every command the
    /// profile leaves out at its default; null for a raw profile. It is shared by every instrument
    /// built from this profile: do not change it (its trace-query dictionaries included).
    /// </summary>
    public ScpiCommandSet? ScpiCommands { get; private init; }

    /// <summary>Scpi: timeouts, error-queue draining, framing and reset on connect; null for a raw profile.</summary>
    public ScpiInstrumentOptions? ScpiOptions { get; private init; }

    /// <summary>Raw: the section of <paramref name="kind"/> as <typeparamref name="T"/>, or null when the profile has none of that type.</summary>
    public T? SectionOf<T>(InstrumentKind kind) where T : class =>
        Sections.TryGetValue(kind, out var section) ? section as T : null;

    internal static DriverProfile ForRaw(string name, string? description, IReadOnlyList<InstrumentKind> kinds,
        FramingOptions framing, string? acknowledgement, ProfileTiming timing, IdentityRule identity, InstrumentLimits limits,
        ErrorReplyRule? errorReply, BoolWords boolWords, IReadOnlyList<CommandTemplate> onConnect,
        IReadOnlyDictionary<InstrumentKind, object> sections) =>
        new(name, description, AdapterKind.Raw, kinds, framing, timing, limits)
        {
            Acknowledgement = acknowledgement,
            Identity = identity,
            ErrorReply = errorReply,
            BoolWords = boolWords,
            OnConnect = onConnect,
            Sections = sections,
        };

    internal static DriverProfile ForScpi(string name, string? description, IReadOnlyList<InstrumentKind> kinds,
        ProfileTiming timing, InstrumentLimits limits, ScpiCommandSet commands, ScpiInstrumentOptions options) =>
        new(name, description, AdapterKind.Scpi, kinds, options.Framing ?? new FramingOptions(), timing, limits)
        {
            ScpiCommands = commands,
            ScpiOptions = options,
        };

    /// <summary>Reads the profile file at <paramref name="path"/>; messages name the path as given.</summary>
    /// <param name="path">The profile file.</param>
    /// <param name="kinds">The kinds the profile may name; <see cref="InstrumentKindRegistry.BuiltIn"/> when null.</param>
    /// <exception cref="InputFormatException">The file is not a valid profile; it holds every problem found.</exception>
    /// <exception cref="IOException">The file cannot be read.</exception>
    public static DriverProfile Load(string path, InstrumentKindRegistry? kinds = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        return Parse(File.ReadAllText(path), path, kinds);
    }

    /// <summary>Parses profile text. All problems found are reported together in one exception.</summary>
    /// <param name="text">The file's content.</param>
    /// <param name="sourceName">The name used in messages, usually the file's path.</param>
    /// <param name="kinds">The kinds the profile may name; <see cref="InstrumentKindRegistry.BuiltIn"/> when null.</param>
    /// <exception cref="InputFormatException">The text is not a valid profile.</exception>
    public static DriverProfile Parse(string text, string sourceName, InstrumentKindRegistry? kinds = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(sourceName);
        return DriverProfileReader.Read(text, sourceName, kinds ?? InstrumentKindRegistry.BuiltIn);
    }
}
