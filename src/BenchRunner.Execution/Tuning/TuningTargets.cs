using BenchRunner.Core.Figures;
using BenchRunner.Core.Masks;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Tuning;

/// <summary>
/// What a tuning session watches, taken from the plan: the trace being tuned (the one its first
/// <c>check-figures</c> step names, else its first <c>check-mask</c>, else its first swept
/// trace), that trace's mask, and every figure limit of the plan. The figures shown are the
/// filter figures that matter while turning a trimmer (<see cref="StandardKeys"/>), the worst
/// mask margin, and every figure the plan sets a limit on.
/// </summary>
public sealed class TuningTargets
{
    /// <summary>The figures always shown when the trace has them: centre, insertion loss, −3 dB bandwidth, loaded Q.
    /// The worst mask margin is shown as <see cref="FigureKeys.MaskMargin"/>.</summary>
    public static IReadOnlyList<FigureKey> StandardKeys { get; } =
        [FigureKeys.CentreFrequency, FigureKeys.InsertionLoss, FigureKeys.Bandwidth3Db, FigureKeys.LoadedQ];

    private TuningTargets(string? trace, MaskCheck? mask, IReadOnlyList<(string Trace, FigureLimit Limit)> limits)
    {
        Trace = trace;
        MaskStep = mask;
        Limits = limits;
    }

    /// <summary>The name of the trace being tuned, or null when the plan sweeps nothing.</summary>
    public string? Trace { get; }

    /// <summary>The plan's mask check of <see cref="Trace"/>, or null.</summary>
    public MaskCheck? MaskStep { get; }

    /// <summary>Every figure limit of the plan, with the trace it applies to, in plan order.</summary>
    public IReadOnlyList<(string Trace, FigureLimit Limit)> Limits { get; }

    /// <summary>Reads what to watch from <paramref name="plan"/>.</summary>
    public static TuningTargets From(TestPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var steps = plan.AllSteps().ToList();
        var trace = steps.OfType<FigureCheck>().Select(f => f.Trace).FirstOrDefault()
            ?? steps.OfType<MaskCheck>().Select(m => m.Trace).FirstOrDefault()
            ?? steps.OfType<SweepStep>().SelectMany(s => s.Traces).Select(t => t.Name).FirstOrDefault();
        var mask = steps.OfType<MaskCheck>().FirstOrDefault(m => m.Trace == trace);
        var limits = steps.OfType<FigureCheck>().SelectMany(f => f.Limits.Select(l => (f.Trace, l))).ToList();
        return new TuningTargets(trace, mask, limits);
    }

    /// <summary>
    /// The figures of one sweep: the standard figures of <see cref="Trace"/> that it has, the worst
    /// mask margin when there is a mask, then each limited figure not already shown; each with its
    /// change since <paramref name="previous"/> and whether it is inside.
    /// </summary>
    /// <param name="figuresByTrace">The figures of each trace acquired in the sweep, by trace name.</param>
    /// <param name="mask">The evaluation of <see cref="Trace"/> against its mask, or null.</param>
    /// <param name="previous">The previous sweep's figures, or null on the first sweep.</param>
    public IReadOnlyList<TuningFigure> Figures(IReadOnlyDictionary<string, IReadOnlyList<NamedFigure>> figuresByTrace,
        MaskEvaluation? mask, IReadOnlyList<TuningFigure>? previous)
    {
        ArgumentNullException.ThrowIfNull(figuresByTrace);
        var rows = new List<TuningFigure>();
        var before = (previous ?? []).ToDictionary(f => (f.Trace, f.Key), f => f.Value);

        void Add(string traceName, FigureKey key, string label, double? value, FigureLimit? limit, bool? inside)
        {
            double? change = value is { } v && before.TryGetValue((traceName, key), out var old) && old is { } o ? v - o : null;
            rows.Add(new TuningFigure(key, traceName, label, value, change, limit, inside));
        }

        void AddFigure(string traceName, FigureKey key, FigureLimit? limit)
        {
            var figure = figuresByTrace.TryGetValue(traceName, out var list) ? list.FirstOrDefault(f => f.Key == key) : null;
            if (figure is null && limit is null)
            {
                return;
            }

            var value = figure?.Value?.Value;
            bool? inside = limit is null ? null : value is { } v && limit.Passes(v);
            Add(traceName, key, key.Label, value, limit, inside);
        }

        if (Trace is { } tuned)
        {
            foreach (var key in StandardKeys)
            {
                AddFigure(tuned, key, Limits.Where(l => l.Trace == tuned && l.Limit.Key == key).Select(l => l.Limit).FirstOrDefault());
            }

            if (MaskStep is { } step)
            {
                var limit = new FigureLimit(FigureKeys.MaskMargin, 0, null, null, step.Location);
                Add(tuned, FigureKeys.MaskMargin, $"Worst margin to {step.Mask.Name}", mask?.WorstMarginDb, limit, mask?.Passed ?? false);
            }
        }

        foreach (var (traceName, limit) in Limits)
        {
            if (!rows.Any(r => r.Trace == traceName && r.Key == limit.Key))
            {
                AddFigure(traceName, limit.Key, limit);
            }
        }

        return rows;
    }
}
