using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tuning;
using BenchRunner.Instruments.Connections;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.Endpoints;
using BenchRunner.Simulator.NetworkAnalyser;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Tests.Tuning;

public sealed class TuningSessionTests
{
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(60);

    /// <summary>Each sweep of the session "takes" this long: the observer moves the fake clock on after each one.</summary>
    private static readonly TimeSpan Step = TimeSpan.FromSeconds(1);

    private static readonly TimeSpan TurnTime = TimeSpan.FromSeconds(20);

    /// <summary>Collects every sweep and moves the clock on by <see cref="Step"/>; can cancel after a given sweep.</summary>
    private sealed class Stepper(ManualTimeProvider clock, CancellationTokenSource? cancelAfter = null, int cancelAt = 0) : ITuningObserver
    {
        public List<TuningPass> Passes { get; } = [];

        public void OnPass(TuningPass pass)
        {
            Passes.Add(pass);
            clock.Advance(Step);
            if (cancelAfter is not null && pass.Sweep == cancelAt)
            {
                cancelAfter.Cancel();
            }
        }
    }

    private static TestPlan Plan() => PlanFile.Load(RepositoryFiles.Example("plans/psf-137-tune.yaml"));

    /// <summary>A noise-free virtual bench whose board follows the demo trimmer script on <paramref name="clock"/>.</summary>
    private static RunLauncher Runner(ManualTimeProvider clock, SqliteResultStore? store)
    {
        var bench = new VirtualBench(seed: 5, networkAnalyserOptions: new NetworkAnalyserOptions { NoiseEnabled = false });
        bench.NetworkAnalyser.DeviceUnderTest = TuningDemo.Board(clock, TurnTime);
        var transports = SimulatorConnections.Register(new TransportFactory(), new VirtualBenchServers(bench));
        // The SCPI profile has no settling delays, so nothing waits on the fake clock but the session itself.
        var definition = BenchFile.Parse("""
            bench: scpi-vna
            instruments:
              vna:
                kind: network-analyser
                adapter: scpi
                profile: profiles/bench-vna-scpi.yaml
                connection: sim:vna
            """, "scpi-vna.yaml", RepositoryFiles.PathOf("docs/examples"));
        return new RunLauncher(new PlanRunner(definition, transports, clock), store);
    }

    private static RunContext Context() => new("plan text", null, "0.1.0", "test-host") { DutSerial = "PSF-24-0002" };

    /// <summary>
    /// Whether sweep k (at (k−1)·Step on the script) is inside every target, worked out without the
    /// session: the script's trimmer settings, the board's circuit evaluated at the plan's sweep
    /// points, the figures of that trace, and the plan's limits and mask.
    /// </summary>
    private static List<bool> ExpectedInside(TestPlan plan, int sweeps)
    {
        var setup = plan.Steps.OfType<NetworkAnalyserSetup>().Single();
        var axis = FrequencyAxis.Linear(setup.Start, setup.Stop, setup.Points);
        var limits = plan.Steps.OfType<FigureCheck>().Single().Limits;
        var mask = plan.Steps.OfType<MaskCheck>().Single().Mask;
        var script = TuningDemo.Script(TurnTime);
        var inside = new List<bool>();
        for (int k = 1; k <= sweeps; k++)
        {
            var network = Preselector137.BuildNetwork(Preselector137.NominalParts, script.At(Step * (k - 1)));
            var trace = new ComplexTrace(axis, TraceQuantity.S21, axis.Hertz.Select(hz => network.Evaluate(hz, 50).S21));
            var figures = FigureSummary.ForFilter(trace);
            bool figuresInside = limits.All(l => figures.Single(f => f.Key == l.Key).Value is { } v && l.Passes(v.Value));
            inside.Add(figuresInside && mask.Evaluate(trace).Passed);
        }

        return inside;
    }

    /// <summary>The first sweep whose streak of inside sweeps has both the count and the time (sweeps are Step apart).</summary>
    private static int? ExpectedSettleSweep(IReadOnlyList<bool> inside, SettleOptions rule)
    {
        int streakStart = 0;
        for (int k = 1; k <= inside.Count; k++)
        {
            if (!inside[k - 1])
            {
                streakStart = 0;
                continue;
            }

            if (streakStart == 0)
            {
                streakStart = k;
            }

            if (k - streakStart + 1 >= rule.Sweeps && Step * (k - streakStart) >= rule.MinimumTime)
            {
                return k;
            }
        }

        return null;
    }

    [Theory]
    [InlineData(3, 4.0)] // the time binds: 5 sweeps 1 s apart hold 4 s
    [InlineData(6, 2.0)] // the count binds
    public async Task Run_ScriptedTrimmer_SettlesAtTheSweepTheScriptAndTargetsGive(int sweeps, double seconds)
    {
        var plan = Plan();
        var rule = new SettleOptions { Sweeps = sweeps, MinimumTime = TimeSpan.FromSeconds(seconds) };
        var inside = ExpectedInside(plan, 40);
        var expected = ExpectedSettleSweep(inside, rule);
        Assert.NotNull(expected);
        // The hand overshoots: the response passes through the target and out again before it settles.
        int firstInside = inside.IndexOf(true) + 1;
        Assert.Contains(false, inside.Skip(firstInside).Take(expected!.Value - firstInside));

        var clock = new ManualTimeProvider();
        var observer = new Stepper(clock);
        var session = new TuningSession(Runner(clock, null), new TuningOptions { Settle = rule, Interval = TimeSpan.Zero, StopWhenSettled = true }, clock);

        var outcome = await session.RunAsync(plan, Context(), observer, null, CancellationToken.None).WaitAsync(Limit);

        Assert.Equal(expected, outcome.FirstSettledAt);
        Assert.Equal(expected, outcome.Sweeps);
        Assert.True(outcome.Settled);
        Assert.Equal(RunStatus.Passed, outcome.Run.Status);
        Assert.Equal(inside.Take(expected.Value), observer.Passes.Select(p => p.Settle.Inside));
        Assert.True(observer.Passes[^1].Settle.JustSettled);
    }

    [Fact]
    public async Task Run_WithAStore_CommitsEverySweepWithItsFiguresAsOneTuningRun()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var clock = new ManualTimeProvider();
        var t0 = clock.GetUtcNow();
        var observer = new Stepper(clock);
        var steps = new StepCounter();
        var session = new TuningSession(Runner(clock, store), new TuningOptions { Interval = TimeSpan.Zero, MaxSweeps = 7 }, clock);

        var outcome = await session.RunAsync(Plan(), Context(), observer, steps, CancellationToken.None).WaitAsync(Limit);

        Assert.True(outcome.Run.Error is null, outcome.Run.Error);
        var run = store.GetRun(outcome.Run.RunId!.Value)!;
        Assert.Equal(RunMode.Tuning, run.Record.Mode);
        var stored = store.GetSweeps(run.Id);
        Assert.Equal(7, stored.Count);
        Assert.Equal(Enumerable.Range(1, 7), stored.Select(s => s.Sequence));
        // Each sweep carries the time it was taken (1 s apart on the fake clock) and its own figures.
        Assert.Equal(Enumerable.Range(0, 7).Select(i => t0.AddSeconds(i)), stored.Select(s => s.Record.AcquiredUtc!.Value));
        var centres = store.GetFigures(run.Id).Where(f => f.Figure.Key == FigureKeys.CentreFrequency).Select(f => f.Figure.Value?.Value).ToList();
        var shown = observer.Passes.Select(p => p.Figures.Single(f => f.Key == FigureKeys.CentreFrequency).Value).ToList();
        Assert.Equal(shown, centres);
        // Mask and three figure checks per sweep, each tied to its sweep.
        var checks = store.GetChecks(run.Id);
        Assert.Equal(7 * 4, checks.Count);
        Assert.All(stored, s => Assert.Equal(4, checks.Count(c => c.Record.SweepId == s.Id)));
        // The setup step ran once; only the sweep and its checks repeat.
        Assert.Equal(1, steps.Kinds.Count(k => k == "set-network-analyser"));
        Assert.Equal(7, steps.Kinds.Count(k => k == "sweep"));
    }

    [Fact]
    public async Task Run_CancelledMidSession_IsStoppedAndKeepsEverySweep()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var clock = new ManualTimeProvider();
        using var cts = new CancellationTokenSource();
        var observer = new Stepper(clock, cts, cancelAt: 4);
        var session = new TuningSession(Runner(clock, store), new TuningOptions { Interval = TimeSpan.Zero }, clock);

        var outcome = await session.RunAsync(Plan(), Context(), observer, null, cts.Token).WaitAsync(Limit);

        Assert.Equal(RunStatus.Stopped, outcome.Run.Status);
        Assert.Equal(RunStatus.Stopped, store.GetRun(outcome.Run.RunId!.Value)!.Status);
        Assert.Equal(4, outcome.Sweeps);
        Assert.Equal(4, store.GetSweeps(outcome.Run.RunId.Value).Count);
    }

    [Fact]
    public async Task Run_FiguresOfASweep_CarryTheirChangeSinceThePreviousSweepAndTheirTarget()
    {
        var clock = new ManualTimeProvider();
        var observer = new Stepper(clock);
        var session = new TuningSession(Runner(clock, null), new TuningOptions { Interval = TimeSpan.Zero, MaxSweeps = 3 }, clock);

        await session.RunAsync(Plan(), Context(), observer, null, CancellationToken.None).WaitAsync(Limit);

        var first = observer.Passes[0].Figures;
        var second = observer.Passes[1].Figures;
        Assert.Equal(["center_hz", "insertion_loss_db", "bandwidth_3db_hz", "loaded_q", "mask_margin_db"], second.Select(f => f.Key.Word));
        Assert.All(first, f => Assert.Null(f.Change));
        var centre = second.Single(f => f.Key == FigureKeys.CentreFrequency);
        Assert.Equal(centre.Value - first.Single(f => f.Key == FigureKeys.CentreFrequency).Value, centre.Change);
        Assert.Equal(137.5e6, centre.Limit!.Target);
        // At the start the detuned board (middle trimmer 0.77 pF low) is centred well above 137.5 MHz.
        Assert.False(first.Single(f => f.Key == FigureKeys.CentreFrequency).Inside);
        Assert.Null(first.Single(f => f.Key == FigureKeys.LoadedQ).Limit);
        Assert.NotNull(observer.Passes[0].Mask);
        Assert.Equal(401, observer.Passes[0].Trace!.Count);
    }

    [Fact]
    public async Task Run_WithAnInterval_WaitsBetweenSweepStartsOnTheClock()
    {
        var clock = new ManualTimeProvider();
        var passes = new List<TuningPass>();
        var session = new TuningSession(Runner(clock, null), new TuningOptions { Interval = TimeSpan.FromSeconds(2), MaxSweeps = 3 }, clock);
        var observer = new Collecting(passes);

        var running = session.RunAsync(Plan(), Context(), observer, null, CancellationToken.None);
        for (int i = 0; i < 2; i++)
        {
            while (passes.Count <= i)
            {
                await Task.Delay(5);
            }

            await clock.WaitForTimersAsync(1);
            clock.Advance(TimeSpan.FromSeconds(2));
        }

        var outcome = await running.WaitAsync(Limit);

        Assert.Equal(3, outcome.Sweeps);
        Assert.Equal([0.0, 2.0, 4.0], passes.Select(p => p.Elapsed.TotalSeconds));
    }

    private sealed class StepCounter : IRunListener, IEnumerable<RunSubscription>
    {
        public List<string> Kinds { get; } = [];

        public ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
        {
            if (runEvent is StepStarted step)
            {
                Kinds.Add(step.Kind);
            }

            return ValueTask.CompletedTask;
        }

        public IEnumerator<RunSubscription> GetEnumerator()
        {
            yield return RunSubscription.Lossless(this, "step counter");
        }

        System.Collections.IEnumerator System.Collections.IEnumerable.GetEnumerator() => GetEnumerator();
    }

    private sealed class Collecting(List<TuningPass> passes) : ITuningObserver
    {
        public void OnPass(TuningPass pass)
        {
            lock (passes)
            {
                passes.Add(pass);
            }
        }
    }
}
