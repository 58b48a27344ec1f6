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
            ? $"worst margin {QuantityFormat.Signed(w, QuantityUnit.Decibel)} at {at}"
            : "no point under the mask";
        var spans = evaluation.FailingSpans.Count == 0 ? "" : $"; fails {string.Join(", ", evaluation.FailingSpans.Select(s => $"{s.Start} to {s.Stop}"))}";
        var result = new CheckResult(name, $"mask {step.Mask.Name} on {step.Trace}", evaluation.Passed, worst + spans, evaluation.WorstMarginDb, QuantityUnit.Decibel.Symbol);
        return (result, evaluation.WorstMarginAt);
    }

    /// <summary>The check of one figure of <paramref name="traceName"/> against <paramref name="limit"/>.</summary>
    public static CheckResult Figure(string traceName, FigureLimit limit, string step, IReadOnlyList<NamedFigure> figures)
    {
        var figure = figures.FirstOrDefault(f => f.Key == limit.Key);
        var what = $"{limit.Key.Word} of {traceName}";
        var wanted = Describe(limit);
        if (figure?.Value is not { } quantity)
        {
            return new CheckResult(step, what, false, $"not available ({figure?.Reason ?? "not computed"}); wanted {wanted}", null, limit.Unit.Symbol);
        }

        var value = quantity.Value;

        var margins = new List<double>();
        if (limit.Min is { } lo) margins.Add(value - lo);
        if (limit.Max is { } hi) margins.Add(hi - value);
        return new CheckResult(step, what, limit.Passes(value), $"{QuantityFormat.Format(quantity)}; wanted {wanted}",
            margins.Count == 0 ? null : margins.Min(), limit.Unit.Symbol);
    }

    /// <summary>The limit in words, e.g. <c>137.5 MHz ± 300 kHz</c> or <c>at most 4 dB</c> (<see cref="QuantityFormat"/>).</summary>
    public static string Describe(FigureLimit limit) => (limit.Min, limit.Max, limit.Target) switch
    {
        ({ } lo, { } hi, { } t) => $"{Format(t, limit.Unit)} ± {Format((hi - lo) / 2, limit.Unit)}",
        ({ } lo, { } hi, null) => $"{Format(lo, limit.Unit)} to {Format(hi, limit.Unit)}",
        ({ } lo, null, _) => $"at least {Format(lo, limit.Unit)}",
        (null, { } hi, _) => $"at most {Format(hi, limit.Unit)}",
        _ => "any value",
    };

    private static string Format(double value, QuantityUnit unit) => QuantityFormat.Format(value, unit);
}
