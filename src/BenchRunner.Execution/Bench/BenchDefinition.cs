using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Execution.Bench;

/// <summary>A bench as its bench file describes it: its instruments by role and the paths between them.</summary>
/// <param name="Name">The bench's name.</param>
/// <param name="Description">What the bench is, or null.</param>
/// <param name="Instruments">The instruments, keyed by role name, in file order.</param>
/// <param name="Paths">The declared signal paths, in file order.</param>
/// <param name="Source">The bench file's name as used in messages.</param>
public sealed record BenchDefinition(
    string Name,
    string? Description,
    IReadOnlyDictionary<string, BenchInstrument> Instruments,
    IReadOnlyList<SignalPath> Paths,
    string Source)
{
    /// <summary>The path compensation of each spectrum analyser input that has one, by the analyser's role (the bench file's <c>compensation</c> section).</summary>
    public IReadOnlyDictionary<string, InputCompensation> Compensations { get; init; } = new Dictionary<string, InputCompensation>();

    /// <summary>
    /// The kinds of instrument the bench was read with (<see cref="InstrumentKindRegistry.BuiltIn"/>
    /// unless <see cref="BenchFile.Load"/> was given others); its instruments are built and wrapped with them.
    /// </summary>
    public InstrumentKindRegistry Kinds { get; init; } = InstrumentKindRegistry.BuiltIn;

    /// <summary>The compensation declared for <paramref name="role"/>'s input, or null.</summary>
    public InputCompensation? CompensationOf(string role) => Compensations.TryGetValue(role, out var c) ? c : null;

    /// <summary>The paths that leave <paramref name="role"/>'s output.</summary>
    public IEnumerable<SignalPath> PathsFrom(string role) => Paths.Where(p => p.From == role);
}
