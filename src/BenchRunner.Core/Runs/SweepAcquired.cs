using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Runs;

/// <summary>A trace was acquired and its figures computed.</summary>
/// <param name="At">When.</param>
/// <param name="Role">The instrument's role.</param>
/// <param name="TraceName">The name the plan gave the trace.</param>
/// <param name="Trace">The trace, exactly as acquired (and compensated, where the bench says so).</param>
/// <param name="Figures">Its figures.</param>
public sealed record SweepAcquired(DateTimeOffset At, string Role, string TraceName, Trace Trace, IReadOnlyList<NamedFigure> Figures) : RunEvent(At)
{
    /// <summary>The step that acquired it.</summary>
    public string Step { get; init; } = "";

    /// <summary>Conditions noted with the sweep (overloaded, uncalibrated...).</summary>
    public SweepFlags Flags { get; init; }

    /// <summary>The compensation applied, in words, or null when none was declared.</summary>
    public string? Compensation { get; init; }

    /// <summary>The instrument settings in force for the sweep, as JSON, or null when not known.</summary>
    public string? SettingsJson { get; init; }
}
