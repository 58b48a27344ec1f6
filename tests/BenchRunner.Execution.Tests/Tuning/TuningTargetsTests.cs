using BenchRunner.Core.Figures;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Tuning;

namespace BenchRunner.Execution.Tests.Tuning;

public sealed class TuningTargetsTests
{
    private static TestPlan Plan() => PlanFile.Parse("""
        plan: two-traces
        roles:
          vna: network-analyser
        steps:
          - set-network-analyser: { role: vna, start: 127.5 MHz, stop: 147.5 MHz, points: 201 }
          - sweep:
              role: vna
              traces: { S21: passband, S11: match }
          - check-figures:
              trace: passband
              figures:
                loaded_q: { min: 40 }
                peak_db: { min: -3 dB }
          - check-figures:
              trace: match
              figures:
                peak_db: { max: -10 dB }
        """, "two-traces.yaml", RepositoryFiles.PathOf("docs/examples/plans"));

    private static NamedFigure Figure(string word, double? value) =>
        value is { } v ? NamedFigure.Of(FigureKeys.Find(word)!, v) : NamedFigure.Unavailable(FigureKeys.Find(word)!, "not found");

    [Fact]
    public void From_PlanWithFigureChecks_TunesTheFirstCheckedTraceAndListsEveryLimit()
    {
        var targets = TuningTargets.From(Plan());

        Assert.Equal("passband", targets.Trace);
        Assert.Null(targets.MaskStep);
        Assert.Equal([("passband", "loaded_q"), ("passband", "peak_db"), ("match", "peak_db")], targets.Limits.Select(l => (l.Trace, l.Limit.Key.Word)));
    }

    [Fact]
    public void Figures_StandardFiguresFirstThenEveryOtherLimitedFigure_WithChangeAndInside()
    {
        var targets = TuningTargets.From(Plan());
        var first = new Dictionary<string, IReadOnlyList<NamedFigure>>
        {
            ["passband"] = [Figure("center_hz", 137.4e6), Figure("loaded_q", 38), Figure("peak_db", -2.5)],
            ["match"] = [Figure("peak_db", -12)],
        };
        var second = new Dictionary<string, IReadOnlyList<NamedFigure>>
        {
            ["passband"] = [Figure("center_hz", 137.45e6), Figure("loaded_q", 41), Figure("peak_db", null)],
            ["match"] = [Figure("peak_db", -9)],
        };

        var before = targets.Figures(first, mask: null, previous: null);
        var after = targets.Figures(second, mask: null, previous: before);

        // insertion_loss_db and bandwidth_3db_hz are absent and have no limit: not shown.
        Assert.Equal([("passband", "center_hz"), ("passband", "loaded_q"), ("passband", "peak_db"), ("match", "peak_db")], after.Select(f => (f.Trace, f.Key.Word)));
        Assert.Equal(0.05e6, after[0].Change!.Value, 1e-3);
        Assert.Null(after[0].Inside);
        Assert.False(before[1].Inside);
        Assert.True(after[1].Inside);
        Assert.Equal(3, after[1].Change);
        // A figure that could not be computed is outside its limit and has no change.
        Assert.Null(after[2].Value);
        Assert.False(after[2].Inside);
        Assert.Null(after[2].Change);
        Assert.True(before[3].Inside);
        Assert.False(after[3].Inside);
    }
}
