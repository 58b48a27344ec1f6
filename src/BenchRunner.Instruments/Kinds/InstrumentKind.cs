using System.Reflection;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Kinds;

/// <summary>
/// A kind of instrument, described once: its word in bench, plan and profile files, its name in
/// messages, the capability interface it provides, what its RF ports are, and the hooks that build
/// everything the adapters and the resilience layer need for it. The built-in kinds are
/// <see cref="NetworkAnalyser"/>, <see cref="SpectrumAnalyser"/> and <see cref="SignalGenerator"/>;
/// a further kind is a subclass registered with <see cref="InstrumentKindRegistry.Add"/>, and no
/// adapter, reader or wrapper changes for it.
/// <para>
/// Kinds are compared by reference: each kind is one instance, shared by every registry that holds it.
/// </para>
/// </summary>
public abstract class InstrumentKind
{
    private static readonly MethodInfo GetCapabilityMethod = typeof(IInstrument).GetMethod(nameof(IInstrument.GetCapability))!;
    private readonly MethodInfo _getCapability;

    /// <summary>Describes a kind.</summary>
    /// <param name="word">The kind's word in files, e.g. <c>network-analyser</c>: lower-case letters, digits and hyphens.</param>
    /// <param name="name">The kind in messages, e.g. <c>network analyser</c>.</param>
    /// <param name="capability">The interface an instrument of this kind offers through <see cref="IInstrument.GetCapability{T}"/>.</param>
    /// <param name="hasProtectedInput">True when it has an RF input that a declared maximum input level protects.</param>
    /// <param name="hasOutput">True when it puts out RF whose level a declared maximum output level bounds.</param>
    /// <exception cref="ArgumentException">A word that is not lower-case letters, digits and hyphens, an empty name, or a capability that is not an interface.</exception>
    protected InstrumentKind(string word, string name, Type capability, bool hasProtectedInput, bool hasOutput)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(word);
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentNullException.ThrowIfNull(capability);
        if (!word.All(c => c is (>= 'a' and <= 'z') or (>= '0' and <= '9') or '-') || !char.IsAsciiLetterLower(word[0]))
        {
            throw new ArgumentException($"The kind word \"{word}\" must start with a lower-case letter and hold only lower-case letters, digits and hyphens.", nameof(word));
        }

        if (!capability.IsInterface)
        {
            throw new ArgumentException($"The capability of kind \"{word}\" must be an interface; {capability.Name} is not.", nameof(capability));
        }

        Word = word;
        Name = name;
        Capability = capability;
        HasProtectedInput = hasProtectedInput;
        HasOutput = hasOutput;
        _getCapability = GetCapabilityMethod.MakeGenericMethod(capability);
    }

    /// <summary>A vector network analyser (<c>network-analyser</c>): <see cref="INetworkAnalyser"/>.</summary>
    public static InstrumentKind NetworkAnalyser => NetworkAnalyserKind.Instance;

    /// <summary>A spectrum analyser (<c>spectrum-analyser</c>): <see cref="ISpectrumAnalyser"/>.</summary>
    public static InstrumentKind SpectrumAnalyser => SpectrumAnalyserKind.Instance;

    /// <summary>A signal generator (<c>signal-generator</c>): <see cref="ISignalGenerator"/>.</summary>
    public static InstrumentKind SignalGenerator => SignalGeneratorKind.Instance;

    /// <summary>The kind's word in bench, plan and profile files, and its section key in a driver profile (e.g. <c>network-analyser</c>).</summary>
    public string Word { get; }

    /// <summary>The kind in messages (e.g. <c>network analyser</c>).</summary>
    public string Name { get; }

    /// <summary>The capability interface an instrument of this kind offers.</summary>
    public Type Capability { get; }

    /// <summary>True when the kind has an RF input that a declared maximum input level (<c>max-input-level</c>) protects.</summary>
    public bool HasProtectedInput { get; }

    /// <summary>True when the kind puts out RF whose level a declared maximum output level (<c>max-output-level</c>) bounds.</summary>
    public bool HasOutput { get; }

    /// <summary>The kind's word.</summary>
    public override string ToString() => Word;

    /// <summary>True when <paramref name="instrument"/> offers this kind's capability.</summary>
    public bool IsOfferedBy(IInstrument instrument)
    {
        ArgumentNullException.ThrowIfNull(instrument);
        return _getCapability.Invoke(instrument, null) is not null;
    }

    // The hooks are protected, so that a kind in another assembly overrides them as such; the
    // adapters and readers call them through these, which also check what a kind's hook built.
    internal object ResilientCapability(ResilientInstrument owner) => Checked(CreateResilient(owner), "resilient wrapper");

    internal object? RawSection(ProfileSectionReader reader) => ReadProfileSection(reader);

    internal object ProfileCapability(ProfileChannel channel, object section) => Checked(CreateProfileCapability(channel, section), "raw-profile capability");

    internal IScpiCommandSection ScpiDefaults() => DefaultScpiSection() ?? throw Broken("default SCPI section");

    internal IScpiCommandSection ScpiSection(ScpiSectionReader reader) => ReadScpiSection(reader) ?? throw Broken("SCPI section");

    internal object ScpiCapability(ScpiInstrument instrument, IScpiCommandSection section) => Checked(CreateScpiCapability(instrument, section), "SCPI capability");

    /// <summary>
    /// Builds the capability object that stands in front of <paramref name="owner"/>'s current adapter:
    /// every call goes through <see cref="ResilientInstrument.ExecuteAsync{T}"/>, and the settings it
    /// needs again after a reconnect are registered with <see cref="ResilientInstrument.Remember"/>.
    /// Must implement <see cref="Capability"/>.
    /// </summary>
    protected abstract object CreateResilient(ResilientInstrument owner);

    /// <summary>
    /// Reads the kind's section of an <c>adapter: raw</c> driver profile (the key <see cref="Word"/>),
    /// called only when the profile has that section. Returns the section's commands, or null when
    /// a problem was found (reported through <paramref name="reader"/>).
    /// </summary>
    protected abstract object? ReadProfileSection(ProfileSectionReader reader);

    /// <summary>
    /// Builds the capability of a raw-profile instrument from the section that
    /// <see cref="ReadProfileSection"/> returned. Must implement <see cref="Capability"/>.
    /// </summary>
    protected abstract object CreateProfileCapability(ProfileChannel channel, object section);

    /// <summary>
    /// The kind's SCPI commands when a command set says nothing of them: a disabled section of
    /// defaults (<see cref="ScpiCommandSet(InstrumentKindRegistry)"/>).
    /// </summary>
    protected abstract IScpiCommandSection DefaultScpiSection();

    /// <summary>
    /// Reads the kind's section of an <c>adapter: scpi</c> driver profile: every command written there
    /// replaces its default; the section is enabled when the profile lists the kind. Called for
    /// every registered kind, so that a section without its kind can be reported.
    /// </summary>
    protected abstract IScpiCommandSection ReadScpiSection(ScpiSectionReader reader);

    /// <summary>Builds the capability of a SCPI instrument from its enabled section. Must implement <see cref="Capability"/>.</summary>
    protected abstract object CreateScpiCapability(ScpiInstrument instrument, IScpiCommandSection section);

    private object Checked(object built, string what) =>
        Capability.IsInstanceOfType(built) ? built : throw Broken($"{what} ({built?.GetType().Name ?? "null"}, not a {Capability.Name})");

    private InvalidOperationException Broken(string what) => new($"The instrument kind \"{Word}\" built no valid {what}.");
}
