using BenchRunner.Daemon.Tests.Support;
using BenchRunner.Daemon.Work;

namespace BenchRunner.Daemon.Tests.Hosting;

public sealed class BenchDaemonParallelTests
{
    [Fact]
    public async Task PlansOnDifferentInstruments_RunAtTheSameTime()
    {
        await using var rig = new DaemonRig();
        rig.Start();
        // The network-analyser plan is long; the spectrum-analyser plan must start while it still holds its lease.
        rig.Drop("long-vna.yaml", TestPlans.Vna("long-vna", sweeps: 300, wait: "100 ms"));
        await rig.WaitUntilAsync(() => Taken(rig, "vna") is not null, "the network analyser's lease");
        rig.Drop("floor.yaml", TestPlans.Sa("floor"));

        var floor = await rig.WaitForFinishedAsync("floor");

        Assert.Equal("passed", floor.Status);
        var vnaTaken = Taken(rig, "vna")!;
        var saTaken = Taken(rig, "sa")!;
        Assert.NotEqual(vnaTaken.Holder, saTaken.Holder);
        // The analyser plan ran while the network analyser's lease was still held: the two overlap.
        Assert.DoesNotContain(rig.LeaseChanges, c => !c.Taken && c.Holder == vnaTaken.Holder);
        Assert.True(saTaken.At >= vnaTaken.At);
    }

    [Fact]
    public async Task PlansOnOneInstrument_TakeTurns()
    {
        await using var rig = new DaemonRig();
        rig.Start();
        rig.Drop("first.yaml", TestPlans.Vna("first", sweeps: 3, wait: "100 ms"));
        rig.Drop("second.yaml", TestPlans.Vna("second", sweeps: 3, wait: "100 ms"));

        await rig.WaitForFinishedAsync("first");
        await rig.WaitForFinishedAsync("second");

        var vna = rig.LeaseChanges.Where(c => c.Instruments.Contains("vna") && c.Holder != "probe").ToList();
        Assert.Equal(4, vna.Count);
        // Taken, given back, taken, given back: never two holders at once.
        Assert.Equal([true, false, true, false], vna.Select(c => c.Taken));
        Assert.Equal(vna[0].Holder, vna[1].Holder);
        Assert.Equal(vna[2].Holder, vna[3].Holder);
        Assert.NotEqual(vna[0].Holder, vna[2].Holder);
        Assert.True(vna[2].At >= vna[1].At);
    }

    [Fact]
    public async Task InstrumentThatDisappears_IsRetriedWithBackoff_WhileOtherInstrumentsKeepWorking()
    {
        var bench = new SwitchableBench();
        await using var rig = new DaemonRig(bench);
        rig.Start();
        await rig.WaitUntilAsync(() => rig.Daemon.Snapshot().Instruments.All(i => i.Health == "healthy"), "the start-up probes");
        bench.Unplug("vna");
        rig.Drop("needs-vna.yaml", TestPlans.Vna("needs-vna"));

        await rig.WaitUntilAsync(() => rig.Log.Named("InstrumentStillFaulty").Count >= 2, "the network analyser to be retried twice");
        var vna = rig.Daemon.Snapshot().Instruments.Single(i => i.Name == "vna");
        Assert.Equal("faulty", vna.Health);
        Assert.Contains("unplugged", vna.LastFault, StringComparison.Ordinal);
        // The waits grow: 200 ms, 400 ms, 800 ms, then the 1 s cap.
        var waits = rig.Log.Named("InstrumentFaulty").Concat(rig.Log.Named("InstrumentStillFaulty")).Select(e => (double)e.Values["WaitSeconds"]!).ToList();
        Assert.Equal(waits.Order(), waits);
        Assert.True(waits[^1] > waits[0]);

        // Meanwhile a plan on the spectrum analyser runs and passes.
        rig.Drop("floor.yaml", TestPlans.Sa("floor"));
        Assert.Equal("passed", (await rig.WaitForFinishedAsync("floor")).Status);
        Assert.DoesNotContain(rig.Finished, f => f.Plan == "needs-vna");

        bench.PlugIn("vna");
        var finished = await rig.WaitForFinishedAsync("needs-vna");
        Assert.Equal("passed", finished.Status);
        Assert.Single(rig.Log.Named("InstrumentBack"), e => (string?)e.Values["Instrument"] == "vna");
    }

    private static LeaseChange? Taken(DaemonRig rig, string instrument) =>
        rig.LeaseChanges.FirstOrDefault(c => c.Taken && c.Holder != "probe" && c.Instruments.Contains(instrument));
}
