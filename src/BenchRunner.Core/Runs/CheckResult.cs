using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Runs;

/// <summary>The result of one check of a run.</summary>
/// <param name="Step">The step that made it.</param>
/// <param name="Name">What was checked, e.g. <c>mask psf-137-passband on passband</c> or <c>center_hz of passband</c>.</param>
/// <param name="Passed">Whether it passed.</param>
/// <param name="Detail">The measured value and the limit, in words.</param>
/// <param name="Margin">How far inside (positive) or outside (negative) the limit, when known.</param>
/// <param name="MarginUnit">The margin's unit (dB, Hz, ...).</param>
public sealed record CheckResult(string Step, string Name, bool Passed, string Detail, double? Margin, string? MarginUnit)
{
    /// <summary>What is added to the detail of a check made on a trace measured while the analyser was overloaded.</summary>
    public const string OverloadedNote = "FLAGGED: the trace was measured while the analyser made lines of its own (see the overload check)";

    /// <summary>True when the trace it judged was measured while the analyser made lines of its own; the verdict is then not to be trusted.</summary>
    public bool TraceOverloaded { get; init; }

    /// <summary>For an overload check, every line it judged; empty for other checks.</summary>
    public IReadOnlyList<JudgedLine> Lines { get; init; } = [];

    /// <summary>What was compared: a mask, a figure against its limit, an overload check.</summary>
    public CheckKind Kind { get; init; } = CheckKind.FigureLimit;

    /// <summary>The name of the trace judged (its latest sweep is the one the check belongs to), or null when none.</summary>
    public string? Trace { get; init; }

    /// <summary>Where the worst margin lies, for a mask check.</summary>
    public Frequency? WorstAt { get; init; }

    /// <summary>The check's particulars as JSON (e.g. every line of an overload check), or null.</summary>
    public string? DetailJson { get; init; }
}
