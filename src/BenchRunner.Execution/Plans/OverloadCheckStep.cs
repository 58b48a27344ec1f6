using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// <c>check-overload</c>: sweeps a spectrum analyser at its present settings, again with the input
/// attenuation raised by <paramref name="RaiseBy"/>, and judges each line above
/// <paramref name="Threshold"/> real or made by the analyser (docs/measurement-validity.md).
/// </summary>
/// <param name="Name">The step's name, or null.</param>
/// <param name="Location">Where the step starts.</param>
/// <param name="Role">The spectrum analyser's role; an earlier <c>set-spectrum-analyser</c> sets it up.</param>
/// <param name="Trace">The name of the sweep taken at the present attenuation; later checks may judge it.</param>
/// <param name="RaiseBy">How much the attenuation is raised for the second sweep; default 10 dB.</param>
/// <param name="Threshold">Lines strictly above this level are judged; default −90 dBm.</param>
/// <param name="ToleranceDb">The ± window around 0, −step and −2·step, in dB; default 1 dB, below half the step.</param>
/// <param name="Carriers">The carriers known to be present, for naming harmonics and two-tone products; may be empty.</param>
/// <param name="Lines">The lines the plan relies on: the step fails when one is analyser-made. Null means every line judged.</param>
public sealed record OverloadCheckStep(
    string? Name,
    SourceLocation Location,
    string Role,
    NamedTrace Trace,
    Ratio RaiseBy,
    Level Threshold,
    double ToleranceDb,
    IReadOnlyList<Frequency> Carriers,
    IReadOnlyList<Frequency>? Lines) : PlanStep(Name, Location)
{
    /// <summary>The default attenuation step: 10 dB.</summary>
    public static Ratio DefaultRaiseBy { get; } = Ratio.FromDecibels(10);

    /// <summary>The default threshold: −90 dBm.</summary>
    public static Level DefaultThreshold { get; } = Level.FromDbm(-90);

    /// <summary>The default level tolerance: 1 dB.</summary>
    public const double DefaultToleranceDb = 1;

    /// <inheritdoc />
    public override StepKind Kind => StepKinds.CheckOverload;
}
