using System.Text.Json;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Validity;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tests.Support;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Generator;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Tests.Running;

/// <summary>The check-overload step on the virtual bench: the analyser's own harmonics against the generator's real ones.</summary>
public sealed class OverloadStepTests
{
    /// <summary>
    /// A generator at −6 dBm through the bench's 1 dB cable (−7 dBm at the analyser) with a real
    /// 2nd harmonic at −20 dBc and a 3rd at −80 dBc, into an analyser with IIP2 +35 dBm and IIP3
    /// +10 dBm (its defaults). At 0 dB attenuation the analyser's own 2nd harmonic is
    /// 2·(−7) − 35 = −49 dBm, 22 dB under the real −27 dBm one; its own 3rd is 3·(−7) − 20 = −41 dBm,
    /// 46 dB over the real −87 dBm one (MixerProducts; Application Note 150, ch. "Dynamic Range";
    /// from memory). So with 10 dB more attenuation the 2nd harmonic stays put and the 3rd falls by
    /// 20 dB, the 3 dB/dB rule.
    /// </summary>
    private static (RunLauncher Runner, VirtualBench Bench) Create(SqliteResultStore? store, string benchFile = "bench-virtual.yaml") =>
        Create(store, BenchFile.Load(RepositoryFiles.Example(benchFile)));

    private static (RunLauncher Runner, VirtualBench Bench) Create(SqliteResultStore? store, BenchDefinition definition)
    {
        var harmonics = new[] { GeneratorHarmonic.Of(2, Ratio.FromDecibels(-20)), GeneratorHarmonic.Of(3, Ratio.FromDecibels(-80)) };
        var bench = new VirtualBench(5, path: FixedPath.Loss(Ratio.FromDecibels(1)), generatorOptions: new SignalGeneratorOptions { Harmonics = harmonics });
        return (VirtualRuns.Runner(bench, store, definition), bench);
    }

    private static TestPlan Plan(string lines, string level = "-6 dBm") => PlanFile.Parse($$"""
        plan: harmonics
        roles:
          gen: signal-generator
          sa: spectrum-analyser
        steps:
          - set-generator: { role: gen, frequency: 137.5 MHz, level: {{level}}, output: on }
          - set-spectrum-analyser: { role: sa, start: 130 MHz, stop: 420 MHz, rbw: 1 MHz, attenuation: 0 dB }
          - name: harmonics real
            check-overload:
              role: sa
              trace: harmonics
              threshold: -75 dBm
              carriers: [137.5 MHz]
              {{lines}}
          - name: carrier level
            check-figures: { trace: harmonics, figures: { peak_dbm: { min: -20 dBm } } }
        """, "harmonics.yaml", RepositoryFiles.PathOf("docs/examples/plans"));

    private static RunContext Context() => VirtualRuns.Context() with { DutSerial = "PSF-24-0001" };

    private static JudgedLine LineAt(CheckResult check, double megahertz) =>
        Assert.Single(check.Lines, l => Math.Abs(l.Frequency.Megahertz - megahertz) < 1);

    [Fact]
    public async Task CheckOverload_RealSecondHarmonicAndAnalysersThirdHarmonic_AreToldApart()
    {
        var (runner, _) = Create(store: null);

        var outcome = await runner.RunAsync(Plan("lines: [275 MHz]"), Context(), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        var check = outcome.Checks[0];
        var carrier = LineAt(check, 137.5);
        var second = LineAt(check, 275);
        var third = LineAt(check, 412.5);
        Assert.Equal(("carrier 1", OverloadClass.Real), (carrier.Label, carrier.Class));
        Assert.Equal(("H2 of carrier 1", OverloadClass.Real), (second.Label, second.Class));
        Assert.Equal(0, second.ChangeDb!.Value, 0.5);
        // The generator's own −20 dBc, read at the nearest trace point on both (the same RBW loss).
        Assert.Equal(-20, second.RelativeDbc!.Value, 0.5);
        Assert.Equal(("H3 of carrier 1", OverloadClass.AnalyserThirdOrder), (third.Label, third.Class));
        // 3 dB/dB rule: 10 dB more attenuation lowers the mixer level 10 dB and the 3rd-order product 30 dB,
        // shown 20 dB lower after the 10 dB correction (REFERENCES.md, Spectrum-analyser distortion [book]).
        Assert.Equal(-20, third.ChangeDb!.Value, 0.5);
        Assert.True(third.IsAnalyserMade);
        Assert.False(third.Relied);
        Assert.True(second.Relied);

        // The line the plan relies on is real: the step passes, but the trace is flagged for later checks.
        Assert.True(check.Passed, check.Detail);
        Assert.Contains("analyser-made elsewhere: 412.5 MHz H3 of carrier 1", check.Detail);
        var level = outcome.Checks[1];
        Assert.True(level.TraceOverloaded);
        Assert.Contains(CheckResult.OverloadedNote, level.Detail);
        Assert.Equal(RunStatus.Passed, outcome.Status);
    }

    [Fact]
    public async Task CheckOverload_LineThePlanReliesOnIsAnalyserMade_FailsWithAdvice()
    {
        var (runner, _) = Create(store: null);

        var outcome = await runner.RunAsync(Plan("lines: [412.5 MHz]"), Context(), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        var check = outcome.Checks[0];
        Assert.False(check.Passed);
        Assert.Contains("the analyser made 1 line the plan relies on: 412.5 MHz H3 of carrier 1", check.Detail);
        Assert.Contains(OverloadVerdict.OverloadAdvice, check.Detail);
        Assert.Equal(RunStatus.Failed, outcome.Status);
        // The overload check judges the analyser itself: it is not flagged as judging an overloaded trace; later checks are.
        Assert.False(check.TraceOverloaded);
        Assert.DoesNotContain(CheckResult.OverloadedNote, check.Detail, StringComparison.Ordinal);
        Assert.True(outcome.Checks[1].TraceOverloaded);
    }

    [Fact]
    public async Task CheckOverload_DrivenGently_AllLinesRealAndNothingFlagged()
    {
        // At −31 dBm into the analyser its own 3rd harmonic is 3·(−31) − 20 = −113 dBm, far below the floor.
        var (runner, _) = Create(store: null);

        var outcome = await runner.RunAsync(Plan("", level: "-30 dBm"), Context(), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        var check = outcome.Checks[0];
        Assert.True(check.Passed, check.Detail);
        Assert.All(check.Lines, l => Assert.Equal(OverloadClass.Real, l.Class));
        Assert.Contains(check.Lines, l => l.Label == "H2 of carrier 1");
        Assert.False(outcome.Checks[1].TraceOverloaded);
    }

    [Fact]
    public async Task CheckOverload_WithAStore_RecordsBothSweepsTheVerdictAndTheFlags()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var (runner, bench) = Create(store);

        var outcome = await runner.RunAsync(Plan("lines: [275 MHz]"), Context(), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        var runId = outcome.RunId!.Value;
        var sweeps = store.GetSweeps(runId);
        Assert.Equal(["harmonics", "harmonics" + PlanRunner.RaisedTraceSuffix], sweeps.Select(s => s.Record.TraceName));
        Assert.Equal(SweepFlags.Overloaded, sweeps[0].Record.Flags);
        Assert.Equal("no path compensation", sweeps[0].Record.Compensation);
        var checks = store.GetChecks(runId);
        Assert.Equal(CheckKind.Overload, checks[0].Record.Kind);
        Assert.Equal(sweeps[0].Id, checks[0].Record.SweepId);
        using var detail = JsonDocument.Parse(checks[0].Record.DetailJson!);
        Assert.Contains(detail.RootElement.GetProperty("lines").EnumerateArray(),
            l => l.GetProperty("class").GetString() == "analyser_third_order" && l.GetProperty("label").GetString() == "H3 of carrier 1");
        Assert.Equal(CheckFlags.TraceOverloaded, checks[1].Record.Flags);
        // The analyser is left as the plan set it.
        Assert.Equal(Ratio.FromDecibels(0), bench.SpectrumAnalyser.InputAttenuation);
    }

    [Fact]
    public async Task Sweep_BehindACompensatedProbe_ReportsLevelsAtTheProbedPointAndRecordsWhatWasCompensated()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var (runner, _) = Create(store, "bench-probe.yaml");
        var plan = PlanFile.Parse("""
            plan: probed
            roles:
              gen: signal-generator
              sa: spectrum-analyser
            steps:
              - set-generator: { role: gen, frequency: 137.5 MHz, level: -30 dBm, output: on }
              - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 1 MHz, rbw: 10 kHz, attenuation: 10 dB }
              - sweep: { role: sa, traces: { power: probed } }
              - check-figures: { trace: probed, figures: { peak_dbm: { target: 9.1 dBm, tolerance: 0.5 dB } } }
            """, "probed.yaml", dir.Path);

        var outcome = await runner.RunAsync(plan, Context(), null, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        // −30 dBm − 1 dB cable = −31 dBm at the analyser; + 39.554 dB probe (REFERENCES.md [calc]) + 0.3 dB DC block
        // + 0.375 dB cable at 137.5 MHz (interpolated between 0.2 dB at 50 MHz and 0.4 dB at 150 MHz) = +9.229 dBm at the
        // probed point, less the analyser's small mixer compression.
        Assert.True(outcome.Checks.Single().Passed, outcome.Checks.Single().Detail);
        var sweep = Assert.Single(store.GetSweeps(outcome.RunId!.Value));
        Assert.StartsWith("compensated: probe 4.7 kOhm into 50 Ohm (39.554 dB) + DC block 0.3 dB + cable table", sweep.Record.Compensation);
        var sa = Assert.Single(store.GetInstruments(outcome.RunId.Value), i => i.Role == "sa");
        Assert.Contains("\"series_ohms\":4700", sa.CompensationJson);
    }

    [Fact]
    public async Task Sweep_OutsideTheCableTable_IsStoredAsReadAndFlaggedUncalibrated()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var definition = BenchFile.Parse("""
            bench: b
            instruments:
              sa: { kind: spectrum-analyser, adapter: scpi, profile: profiles/bench-sa-scpi.yaml, connection: "sim:sa?dialect=scpi" }
            compensation:
              sa:
                attenuators: [20 dB]
                cable: { 137 MHz: 0.3 dB, 138 MHz: 0.3 dB }
            """, "bench.yaml", RepositoryFiles.Example(""));
        var (runner, _) = Create(store, definition);
        var plan = PlanFile.Parse("""
            plan: wide
            roles: { sa: spectrum-analyser }
            steps:
              - set-spectrum-analyser: { role: sa, centre: 137.5 MHz, span: 4 MHz }
              - sweep: { role: sa, traces: { power: wide } }
            """, "wide.yaml", dir.Path);
        var observer = new CollectingObserver();

        var outcome = await runner.RunAsync(plan, Context(), observer, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.True(outcome.Status == RunStatus.Passed, outcome.Error);
        var sweep = Assert.Single(store.GetSweeps(outcome.RunId!.Value));
        Assert.Equal(SweepFlags.Uncalibrated, sweep.Record.Flags);
        Assert.StartsWith("not compensated: 135.5 MHz is outside the cable loss table", sweep.Record.Compensation);
        Assert.Contains(observer.Events.OfType<OperatorMessage>(), m => m.Text.Contains("NOT compensated", StringComparison.Ordinal));
    }
}
