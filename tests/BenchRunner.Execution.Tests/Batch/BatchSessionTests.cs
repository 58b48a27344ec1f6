using BenchRunner.Execution.Batch;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.LimitRecords;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tests.Support;
using BenchRunner.Instruments.Connections;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Tests.Batch;

public sealed class BatchSessionTests : IDisposable
{
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(60);
    private readonly TempDirectory _dir = new();
    private readonly SqliteResultStore _store;
    private readonly VirtualBench _bench = VirtualBench.CreateDemo(seed: 5);
    private readonly Boards _boards;

    public BatchSessionTests()
    {
        _store = SqliteResultStore.Open(_dir.PathOf("lot.db"));
        _boards = new Boards(_bench);
    }

    public void Dispose()
    {
        _store.Dispose();
        _dir.Dispose();
    }

    /// <summary>A fixture holding boards by serial; a test may rework a board by swapping it.</summary>
    private sealed class Boards(VirtualBench bench) : IBoardFixture
    {
        public Dictionary<string, ITwoPort> BySerial { get; } = [];

        public List<string> Prepared { get; } = [];

        public Task<FixtureResult> PrepareAsync(string serial, CancellationToken cancellationToken)
        {
            Prepared.Add(serial);
            if (!BySerial.TryGetValue(serial, out var board))
            {
                return Task.FromResult(FixtureResult.NotReady($"no board {serial} at hand"));
            }

            bench.NetworkAnalyser.DeviceUnderTest = board;
            return Task.FromResult(FixtureResult.InPlace);
        }
    }

    private BatchSession Session()
    {
        var runner = VirtualRuns.Runner(_bench, _store);
        return new BatchSession(runner, VirtualRuns.CheckPlan(), VirtualRuns.Context() with { Lot = "PSF-24-L07", Operator = "tester" }, _store, _boards);
    }

    [Fact]
    public async Task TestAsync_NewBoard_IsABatchRunOfTheLotWithItsLimitsRecorded()
    {
        _boards.BySerial["PSF-24-0001"] = Preselector137.TunedBoard();

        var result = await Session().TestAsync(" PSF-24-0001 ", null, CancellationToken.None).WaitAsync(Limit);

        Assert.True(result.HasVerdict);
        Assert.True(result.Passed);
        Assert.False(result.IsRetest);
        var run = _store.GetRun(result.Outcome!.RunId!.Value)!;
        Assert.Equal(RunMode.Batch, run.Record.Mode);
        Assert.Equal("PSF-24-0001", run.Record.DutSerial);
        Assert.Equal("PSF-24-L07", run.Record.Lot);
        Assert.False(run.Record.IsRetest);
        Assert.Equal(3, PlanLimits.FromRunJson(run.Record.ExtraJson)!.Figures.Count);
    }

    [Fact]
    public async Task TestAsync_ReworkedBoard_IsFlaggedAsRetestAndItsHistoryIsKept()
    {
        var session = Session();
        _boards.BySerial["PSF-24-0002"] = Preselector137.DetunedBoard();
        var first = await session.TestAsync("PSF-24-0002", null, CancellationToken.None).WaitAsync(Limit);
        // Reworked: the trimmers are set right, and the board comes back.
        _boards.BySerial["PSF-24-0002"] = Preselector137.TunedBoard();

        var second = await session.TestAsync("PSF-24-0002", null, CancellationToken.None).WaitAsync(Limit);

        Assert.False(first.Passed);
        Assert.False(first.IsRetest);
        Assert.True(second.Passed);
        Assert.True(second.IsRetest);
        var runs = _store.ListRuns(new RunFilter { DutSerial = "PSF-24-0002" });
        Assert.Equal(2, runs.Count);
        Assert.Equal([RunStatus.Passed, RunStatus.Failed], runs.Select(r => r.Status));
        Assert.True(runs[0].Record.IsRetest);
        var verdict = Assert.Single(_store.LatestVerdictPerSerial("PSF-24-L07"));
        Assert.Equal(RunStatus.Passed, verdict.Verdict);
    }

    [Fact]
    public async Task TestAsync_FixtureWithoutTheBoard_LeavesItUntestedAndRecordsNothing()
    {
        var result = await Session().TestAsync("PSF-24-0042", null, CancellationToken.None).WaitAsync(Limit);

        Assert.False(result.HasVerdict);
        Assert.Null(result.Outcome);
        Assert.Equal("no board PSF-24-0042 at hand", result.NotTestedReason);
        Assert.Empty(_store.ListRuns());
    }

    [Fact]
    public async Task TestAsync_StoppedByTheOperator_RecordsAStoppedRunAndGivesNoVerdict()
    {
        _boards.BySerial["PSF-24-0003"] = Preselector137.TunedBoard();
        using var stop = new CancellationTokenSource();
        stop.Cancel();

        var result = await Session().TestAsync("PSF-24-0003", null, stop.Token).WaitAsync(Limit);

        Assert.False(result.HasVerdict);
        Assert.Equal(RunStatus.Stopped, result.Outcome!.Status);
        Assert.Contains("stopped", result.NotTestedReason);
        Assert.Equal(RunStatus.Stopped, Assert.Single(_store.ListRuns()).Status);
        Assert.False(await Session().HasVerdictAsync("PSF-24-0003"));
    }

    [Fact]
    public void Create_WithoutALot_IsRefused()
    {
        var transports = new TransportFactory();
        var definition = BenchFile.Load(RepositoryFiles.Example("bench-virtual.yaml"));
        var plan = PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml"));

        Assert.Throws<ArgumentException>(() => new BatchSession(new RunLauncher(new PlanRunner(definition, transports), _store), plan,
            new RunContext("plan text", null, "0.1.0", "host"), _store, _boards));
    }
}
