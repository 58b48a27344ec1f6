using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Runs;
using BenchRunner.Storage.Recording;
using BenchRunner.Storage.Sqlite;
using BenchRunner.Storage.Tests.Support;

namespace BenchRunner.Storage.Tests.Recording;

public sealed class RunRecorderTests
{
    private static readonly DateTimeOffset T0 = new(2025, 3, 14, 9, 30, 0, TimeSpan.Zero);

    private static async Task Feed(RunRecorder recorder, params RunEvent[] events)
    {
        foreach (var e in events)
        {
            await recorder.OnEventAsync(e, CancellationToken.None);
        }
    }

    [Fact]
    public async Task OnEvent_AWholeRun_BecomesItsRowsWithEachCheckTiedToTheLatestSweepOfItsTrace()
    {
        using var dir = new TempDirectory();
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var recorder = new RunRecorder(store);
        var header = new RunHeader(RunMode.Batch, "psf-137-check", "plan: psf-137-check\n", "0.1.0", "bench-pc")
        {
            BenchName = "virtual", DutSerial = "PSF-24-0001", Lot = "PSF-24-L07", LimitsJson = "{\"limits\":[]}",
        };
        var trace = Samples.PassbandS21();
        var figures = new[] { NamedFigure.Of(FigureKeys.CentreFrequency, 137.5e6) };

        await Feed(recorder,
            new RunStarted(T0, header),
            new InstrumentConnected(T0, "vna", "network-analyser", "BenchRunner", "Virtual VNA", "SIM-1", "1.0") { Connection = "sim:vna" },
            new SweepAcquired(T0.AddSeconds(1), "vna", "passband", trace, figures) { Step = "first" },
            new SweepAcquired(T0.AddSeconds(2), "vna", "passband", trace, figures) { Step = "second" },
            new CheckCompleted(T0.AddSeconds(3), new CheckResult("check", "mask psf-137-passband on passband", false, "worst margin -0.70 dB", -0.7, "dB")
            {
                Kind = CheckKind.Mask, Trace = "passband", WorstAt = Frequency.FromMegahertz(136.2), TraceOverloaded = true,
            }),
            new CheckCompleted(T0.AddSeconds(3), new CheckResult("repeat", "repeat until", false, "did not hold", null, null)),
            new RunEnded(T0.AddSeconds(4), RunStatus.Failed, null));

        long id = await recorder.RunId;
        var run = store.GetRun(id)!;
        Assert.Equal(RunStatus.Failed, run.Status);
        Assert.Equal("PSF-24-L07", run.Record.Lot);
        Assert.Equal("{\"limits\":[]}", run.Record.ExtraJson);
        Assert.Equal("SIM-1", Assert.Single(store.GetInstruments(id)).Serial);
        var sweeps = store.GetSweeps(id);
        Assert.Equal(["first", "second"], sweeps.Select(s => s.Record.StepName));
        var checks = store.GetChecks(id);
        Assert.Equal(sweeps[1].Id, checks[0].Record.SweepId);
        Assert.Equal(CheckFlags.TraceOverloaded, checks[0].Record.Flags);
        Assert.Equal(136.2, checks[0].Record.WorstFrequency!.Value.Megahertz, 9);
        Assert.Null(checks[1].Record.SweepId);
    }

    [Fact]
    public async Task RunId_WhenTheStoreRefusesTheStart_FaultsAndTheFailureIsPassedOn()
    {
        using var dir = new TempDirectory();
        var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        store.Dispose();
        var recorder = new RunRecorder(store);

        await Assert.ThrowsAnyAsync<Exception>(() => Feed(recorder, new RunStarted(T0, new RunHeader(RunMode.Single, "p", "plan: p\n", "0.1.0", "h"))));
        await Assert.ThrowsAnyAsync<Exception>(() => recorder.RunId);
        Assert.Null(recorder.RunIdIfKnown);
    }
}
