namespace BenchRunner.Execution.LimitRecords;

/// <summary>A figure limit of a plan, as recorded with a run; values in the figure's own unit.</summary>
/// <param name="Trace">The name of the trace whose figure is limited.</param>
/// <param name="Key">The figure's key, e.g. <c>center_hz</c>.</param>
/// <param name="Unit">The figure's unit symbol ("Hz", "dB", "dBm" or "").</param>
/// <param name="Min">The lowest passing value (the lower specification limit), or null.</param>
/// <param name="Max">The highest passing value (the upper specification limit), or null.</param>
/// <param name="Target">The target, when the limit was written as target ± tolerance.</param>
public sealed record RecordedFigureLimit(string Trace, string Key, string Unit, double? Min, double? Max, double? Target)
{
    /// <summary>The check name the runner gives this limit, e.g. <c>center_hz of passband</c>.</summary>
    public string CheckName => $"{Key} of {Trace}";
}
