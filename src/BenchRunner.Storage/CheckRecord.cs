using BenchRunner.Core.Quantities;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage;

/// <summary>The outcome of one check; given to <see cref="IResultWriter.AddCheckAsync"/>. Numbers must be finite.</summary>
/// <param name="Name">The check's name in the plan.</param>
/// <param name="Kind">Mask, figure limit or overload check.</param>
/// <param name="Passed">Whether it passed.</param>
public sealed record CheckRecord(string Name, CheckKind Kind, bool Passed)
{
    /// <summary>The sweep it judged (a sweep of the same run), if any.</summary>
    public long? SweepId { get; init; }

    /// <summary>What was measured: the figure's value, or for a mask the level at the worst point.</summary>
    public double? Measured { get; init; }

    /// <summary>The unit of <see cref="Measured"/> (<c>Hz</c>, <c>dB</c>, <c>dBm</c>, empty for a pure number).</summary>
    public string? MeasuredUnit { get; init; }

    /// <summary>The limit as text, for people (e.g. <c>137.2 MHz to 137.8 MHz</c>).</summary>
    public string? LimitText { get; init; }

    /// <summary>How far inside the limit the result was; negative when outside.</summary>
    public double? Margin { get; init; }

    /// <summary>The unit of <see cref="Margin"/> (<c>dB</c> for masks).</summary>
    public string? MarginUnit { get; init; }

    /// <summary>For a mask, where the margin was smallest.</summary>
    public Frequency? WorstFrequency { get; init; }

    /// <summary>A one-line account for people.</summary>
    public string? Message { get; init; }

    /// <summary>Conditions noted with the check, e.g. that the trace it judged was measured while overloaded.</summary>
    public CheckFlags Flags { get; init; }

    /// <summary>What the check judged, line by line, as a JSON document (an overload check's lines); null when there is nothing more.</summary>
    public string? DetailJson { get; init; }
}
