using System.Globalization;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Plans;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Running;

/// <summary>Judges one check and words its result: a figure against its limit, a trace against its mask.</summary>
internal static class CheckJudge
{
    /// <summary>The mask check of <paramref name="trace"/> and where its worst margin lies.</summary>
    public static (CheckResult Result, Frequency? WorstAt) Mask(MaskCheck step, string name, Trace trace)
    {
        var evaluation = step.Mask.Evaluate(trace);
        var worst = evaluation.WorstMarginDb is { } w && evaluation.WorstMarginAt is { } at
            ? $"worst margin {w.ToString("+0.00;-0.00", CultureInfo.InvariantCulture)} dB at {at}"
            : "no point under the mask";
        var spans = evaluation.FailingSpans.Count == 0 ? "" : $"; fails {string.Join(", ", evaluation.FailingSpans.Select(s => $"{s.Start} to {s.Stop}"))}";
        var result = new CheckResult(name, $"mask {step.Mask.Name} on {step.Trace}", evaluation.Passed, worst + spans, evaluation.WorstMarginDb, "dB");
        return (result, evaluation.WorstMarginAt);
    }

    /// <summary>The check of one figure of <paramref name="traceName"/> against <paramref name="limit"/>.</summary>
    public static CheckResult Figure(string traceName, FigureLimit limit, string step, IReadOnlyList<NamedFigure> figures)
    {
        var figure = figures.FirstOrDefault(f => f.Key == limit.Key);
        var what = $"{limit.Key} of {traceName}";
        var wanted = Describe(limit);
        if (figure?.Value is not { } value)
        {
            return new CheckResult(step, what, false, $"not available ({figure?.Reason ?? "not computed"}); wanted {wanted}", null, limit.Unit);
        }

        var margins = new List<double>();
        if (limit.Min is { } lo) margins.Add(value - lo);
        if (limit.Max is { } hi) margins.Add(hi - value);
        return new CheckResult(step, what, limit.Passes(value), $"{Format(value, limit.Unit)}; wanted {wanted}",
            margins.Count == 0 ? null : margins.Min(), limit.Unit);
    }

    /// <summary>The limit in words, e.g. <c>137.5 MHz ± 0.3 MHz</c> or <c>at most 4 dB</c>.</summary>
    public static string Describe(FigureLimit limit) => (limit.Min, limit.Max, limit.Target) switch
    {
        ({ } lo, { } hi, { } t) => $"{Format(t, limit.Unit)} ± {Format((hi - lo) / 2, limit.Unit)}",
        ({ } lo, { } hi, null) => $"{Format(lo, limit.Unit)} to {Format(hi, limit.Unit)}",
        ({ } lo, null, _) => $"at least {Format(lo, limit.Unit)}",
        (null, { } hi, _) => $"at most {Format(hi, limit.Unit)}",
        _ => "any value",
    };

    /// <summary>A figure value in its unit for people.</summary>
    public static string Format(double value, string unit) => unit switch
    {
        "Hz" => Math.Abs(value) >= 1e6 ? $"{(value / 1e6).ToString("0.####", CultureInfo.InvariantCulture)} MHz"
            : Math.Abs(value) >= 1e3 ? $"{(value / 1e3).ToString("0.###", CultureInfo.InvariantCulture)} kHz"
            : $"{value.ToString("0.#", CultureInfo.InvariantCulture)} Hz",
        "" => value.ToString("0.###", CultureInfo.InvariantCulture),
        _ => $"{value.ToString("0.###", CultureInfo.InvariantCulture)} {unit}",
    };
}
