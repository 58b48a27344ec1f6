using BenchRunner.Core.Figures;
using BenchRunner.Core.Statistics;
using BenchRunner.Execution.LimitRecords;

namespace BenchRunner.Reports.Lots;

/// <summary>
/// The spread of one limited figure across a lot: each board's value from its counting (latest)
/// run, their statistics, and the capability against the limit.
/// </summary>
/// <param name="Limit">The figure and its limits (LSL = <see cref="RecordedFigureLimit.Min"/>, USL = <see cref="RecordedFigureLimit.Max"/>).</param>
/// <param name="Values">Each board's value, by serial; boards whose figure could not be computed are left out.</param>
/// <param name="Statistics">Mean, sample standard deviation, minimum and maximum; null with no values.</param>
/// <param name="Capability">Cp and Cpk, or why they cannot be computed.</param>
public sealed record FigureSpread(
    RecordedFigureLimit Limit,
    IReadOnlyList<(string Serial, double Value)> Values,
    SampleStatistics? Statistics,
    FigureResult<ProcessCapability> Capability)
{
    /// <summary>Summarises <paramref name="values"/> against <paramref name="limit"/>.</summary>
    public static FigureSpread Of(RecordedFigureLimit limit, IReadOnlyList<(string Serial, double Value)> values)
    {
        ArgumentNullException.ThrowIfNull(limit);
        ArgumentNullException.ThrowIfNull(values);
        if (values.Count == 0)
        {
            return new FigureSpread(limit, values, null, FigureResult<ProcessCapability>.Unavailable("no board has a value"));
        }

        var statistics = SampleStatistics.From(values.Select(v => v.Value));
        var capability = limit.Min is null && limit.Max is null
            ? FigureResult<ProcessCapability>.Unavailable("the figure has no limit")
            : ProcessCapability.Compute(statistics, limit.Min, limit.Max);
        return new FigureSpread(limit, values, statistics, capability);
    }
}
