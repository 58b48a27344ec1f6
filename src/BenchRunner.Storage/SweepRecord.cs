using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage;

/// <summary>One acquired trace with what belongs to it; given to <see cref="IResultWriter.AddSweepAsync"/>.</summary>
/// <param name="StepName">The plan step that took it.</param>
/// <param name="Trace">The trace: complex S-parameter samples or power levels, kept exactly.</param>
public sealed record SweepRecord(string StepName, Trace Trace)
{
    /// <summary>The role of the instrument that took it.</summary>
    public string? InstrumentRole { get; init; }

    /// <summary>A name for the trace within the step (e.g. <c>passband</c>).</summary>
    public string? TraceName { get; init; }

    /// <summary>The instrument settings in force (span, RBW, level...), as a JSON document.</summary>
    public string? SettingsJson { get; init; }

    /// <summary>Figures computed from the trace; keys must be unique within a sweep. Empty by default.</summary>
    public IReadOnlyList<NamedFigure> Figures { get; init; } = [];

    /// <summary>
    /// What path compensation the levels carry, in one line (e.g. <c>compensated: probe 4.7 kOhm into 50 Ohm (39.554 dB)</c>);
    /// null when the caller says nothing about it.
    /// </summary>
    public string? Compensation { get; init; }

    /// <summary>Conditions noted during the sweep.</summary>
    public SweepFlags Flags { get; init; }

    /// <summary>When it was acquired; null (the default) means the moment it is stored.</summary>
    public DateTimeOffset? AcquiredUtc { get; init; }
}
