using BenchRunner.Daemon.Work;

namespace BenchRunner.Daemon.Tests.Work;

public sealed class InstrumentLeasesTests
{
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(30);

    [Fact]
    public async Task Acquire_DisjointInstruments_AreGrantedAtOnce()
    {
        var leases = new InstrumentLeases(TimeProvider.System);

        using var vna = await leases.AcquireAsync(["vna"], "J1", CancellationToken.None).WaitAsync(Limit);
        using var sa = await leases.AcquireAsync(["sa", "gen"], "J2", CancellationToken.None).WaitAsync(Limit);

        Assert.Equal("J1", leases.Holders["vna"]);
        Assert.Equal("J2", leases.Holders["sa"]);
        Assert.Equal("J2", leases.Holders["gen"]);
    }

    [Fact]
    public async Task Acquire_SharedInstrument_WaitsUntilTheHolderGivesItBack()
    {
        var leases = new InstrumentLeases(TimeProvider.System);
        var first = await leases.AcquireAsync(["vna"], "J1", CancellationToken.None);

        var second = leases.AcquireAsync(["vna", "sa"], "J2", CancellationToken.None);
        Assert.False(second.IsCompleted);
        Assert.False(leases.Holders.ContainsKey("sa"));

        first.Dispose();
        using var granted = await second.WaitAsync(Limit);
        Assert.Equal("J2", leases.Holders["vna"]);
        Assert.Equal("J2", leases.Holders["sa"]);
    }

    [Fact]
    public async Task Acquire_LaterRequest_NeverOvertakesAnEarlierOneWantingTheSameInstrument()
    {
        var leases = new InstrumentLeases(TimeProvider.System);
        var holder = await leases.AcquireAsync(["vna"], "J1", CancellationToken.None);
        var waitsForBoth = leases.AcquireAsync(["vna", "sa"], "J2", CancellationToken.None);

        // "sa" is free, but J2 asked for it first (together with vna), so J3 queues behind J2.
        var wantsSa = leases.AcquireAsync(["sa"], "J3", CancellationToken.None);
        Assert.False(wantsSa.IsCompleted);

        holder.Dispose();
        var j2 = await waitsForBoth.WaitAsync(Limit);
        Assert.False(wantsSa.IsCompleted);
        j2.Dispose();
        using var j3 = await wantsSa.WaitAsync(Limit);
        Assert.Equal("J3", leases.Holders["sa"]);
    }

    [Fact]
    public async Task Acquire_CancelledWhileWaiting_HoldsNothingAndLetsOthersThrough()
    {
        var leases = new InstrumentLeases(TimeProvider.System);
        var holder = await leases.AcquireAsync(["vna"], "J1", CancellationToken.None);
        using var cancel = new CancellationTokenSource();
        var cancelled = leases.AcquireAsync(["vna"], "J2", cancel.Token);
        var next = leases.AcquireAsync(["vna"], "J3", CancellationToken.None);

        await cancel.CancelAsync();
        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => cancelled.WaitAsync(Limit));
        holder.Dispose();

        using var j3 = await next.WaitAsync(Limit);
        Assert.Equal("J3", leases.Holders["vna"]);
    }

    [Fact]
    public async Task Changed_ReportsTheReleaseBeforeTheTakeItAllows()
    {
        var leases = new InstrumentLeases(TimeProvider.System);
        var changes = new List<LeaseChange>();
        leases.Changed += c =>
        {
            lock (changes)
            {
                changes.Add(c);
            }
        };
        var first = await leases.AcquireAsync(["vna"], "J1", CancellationToken.None);
        var second = leases.AcquireAsync(["vna"], "J2", CancellationToken.None);

        first.Dispose();
        (await second.WaitAsync(Limit)).Dispose();

        Assert.Equal([("J1", true), ("J1", false), ("J2", true), ("J2", false)], changes.Select(c => (c.Holder, c.Taken)));
    }
}
