using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Resilience;

public sealed class ResilientInstrumentTests
{
    private static readonly TimeSpan TestLimit = TimeSpan.FromSeconds(10);
    private static readonly NetworkSweep Sweep = new(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145), 3);

    private readonly List<string> _log = [];
    private readonly List<FakeInstrument> _made = [];

    private static InstrumentResilienceOptions FastOptions(int retries = 2, int breakAfter = 6) => new()
    {
        OperationTimeout = TimeSpan.FromMilliseconds(200),
        SweepTimeout = TimeSpan.FromMilliseconds(200),
        RetryAttempts = retries,
        RetryBaseDelay = TimeSpan.FromMilliseconds(1),
        BreakerMinimumThroughput = breakAfter,
        BreakDuration = TimeSpan.FromSeconds(30),
    };

    private ResilientInstrument Create(Action<FakeInstrument, int>? setUp = null, InstrumentResilienceOptions? options = null) =>
        new("vna", () =>
        {
            var fake = new FakeInstrument("vna", _log);
            setUp?.Invoke(fake, _made.Count);
            _made.Add(fake);
            return fake;
        }, options ?? FastOptions());

    [Fact]
    public async Task Acquire_TransientFailure_ReconnectsRestoresTheSweepAndSucceeds()
    {
        // The first adapter's acquisition fails as an unplugged cable would; the second works.
        await using var vna = Create((fake, index) =>
            fake.BeforeOperation = op => { if (index == 0 && op == "acquire") throw new IOException("port vanished"); });
        await vna.ConnectAsync(CancellationToken.None).WaitAsync(TestLimit);
        var analyser = vna.GetCapability<INetworkAnalyser>()!;
        await analyser.ConfigureSweepAsync(Sweep, CancellationToken.None).WaitAsync(TestLimit);

        var traces = await analyser.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(TestLimit);

        Assert.Single(traces);
        Assert.Equal(2, vna.ConnectionCount);
        Assert.True(_made[0].Disposed);
        Assert.Equal(
            ["connect", "sweep 130 MHz..145 MHz/3", "acquire", "dispose", "connect", "sweep 130 MHz..145 MHz/3", "acquire"],
            _log);
    }

    [Fact]
    public async Task Acquire_InstrumentReportedError_IsNotRetried()
    {
        await using var vna = Create((fake, _) =>
            fake.BeforeOperation = op => { if (op == "acquire") throw new InstrumentReportedException(-222, "Data out of range"); });
        await vna.ConnectAsync(CancellationToken.None).WaitAsync(TestLimit);

        var ex = await Assert.ThrowsAsync<InstrumentReportedException>(
            () => vna.GetCapability<INetworkAnalyser>()!.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(TestLimit));

        Assert.Equal("vna", ex.Instrument);
        Assert.StartsWith("vna: ", ex.Message);
        Assert.Equal(1, vna.ConnectionCount);
        Assert.Single(_log, "acquire");
    }

    [Fact]
    public async Task Execute_NonIdempotentOperation_IsNotRetriedAfterATransientFailure()
    {
        await using var vna = Create();
        await vna.ConnectAsync(CancellationToken.None).WaitAsync(TestLimit);
        int attempts = 0;

        await Assert.ThrowsAsync<InstrumentTimeoutException>(() => vna.ExecuteAsync<bool>("step the trimmer", idempotent: false, TimeSpan.FromSeconds(1),
            (_, _) => { attempts++; throw new InstrumentTimeoutException("no reply"); }, CancellationToken.None).WaitAsync(TestLimit));

        Assert.Equal(1, attempts);
    }

    [Fact]
    public async Task Execute_CancelledByTheCaller_IsNotRetried()
    {
        await using var vna = Create();
        await vna.ConnectAsync(CancellationToken.None).WaitAsync(TestLimit);
        using var cts = new CancellationTokenSource();
        int attempts = 0;

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => vna.ExecuteAsync<bool>("sweep", idempotent: true, TimeSpan.FromSeconds(5),
            async (_, ct) => { attempts++; await cts.CancelAsync(); ct.ThrowIfCancellationRequested(); return true; }, cts.Token).WaitAsync(TestLimit));

        Assert.Equal(1, attempts);
    }

    [Fact]
    public async Task Acquire_Hanging_EndsInATimeoutNamingInstrumentAndOperation()
    {
        var never = new TaskCompletionSource();
        await using var vna = Create((fake, _) => fake.Hang = never.Task, FastOptions(retries: 1));
        await vna.ConnectAsync(CancellationToken.None).WaitAsync(TestLimit);

        var ex = await Assert.ThrowsAsync<InstrumentTimeoutException>(
            () => vna.GetCapability<INetworkAnalyser>()!.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(TestLimit));

        Assert.Equal("vna", ex.Instrument);
        Assert.Contains("sweep S21 did not finish within 200 ms", ex.Message);
        Assert.Equal(2, _log.Count(l => l == "acquire"));
    }

    [Fact]
    public async Task Breaker_AfterRepeatedFailures_RestsTheInstrument()
    {
        // One successful connection, then failures: the fifth attempt makes 4 failures in 5 (80 %).
        await using var vna = Create((fake, _) =>
            fake.BeforeOperation = op => { if (op == "acquire") throw new IOException("no device"); },
            FastOptions(retries: 0, breakAfter: 5));
        await vna.ConnectAsync(CancellationToken.None).WaitAsync(TestLimit);
        var analyser = vna.GetCapability<INetworkAnalyser>()!;

        for (int i = 0; i < 4; i++)
        {
            await Assert.ThrowsAsync<IOException>(() => analyser.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(TestLimit));
        }

        var rested = await Assert.ThrowsAsync<InstrumentUnavailableException>(
            () => analyser.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(TestLimit));
        Assert.True(rested.IsTransient);
        Assert.InRange(rested.RetryAfter, TimeSpan.FromSeconds(29), TimeSpan.FromSeconds(30));
        Assert.Contains("vna", rested.Message);
        Assert.Equal(4, _log.Count(l => l == "acquire"));
    }

    [Fact]
    public async Task Generator_AfterReconnect_RestoresFrequencyAndLevelBeforeSwitchingTheOutputOn()
    {
        await using var gen = Create((fake, index) =>
            fake.BeforeOperation = op => { if (index == 0 && op == "level -30 dBm") throw new InstrumentTimeoutException("no reply"); });
        await gen.ConnectAsync(CancellationToken.None).WaitAsync(TestLimit);
        var generator = gen.GetCapability<ISignalGenerator>()!;
        await generator.SetFrequencyAsync(Frequency.FromMegahertz(137.5), CancellationToken.None).WaitAsync(TestLimit);
        await generator.SetLevelAsync(Level.FromDbm(-20), CancellationToken.None).WaitAsync(TestLimit);
        await generator.SetOutputAsync(true, CancellationToken.None).WaitAsync(TestLimit);
        _log.Clear();

        await generator.SetLevelAsync(Level.FromDbm(-30), CancellationToken.None).WaitAsync(TestLimit);

        Assert.Equal(
            ["level -30 dBm", "dispose", "connect", "output off", "frequency 137.5 MHz", "level -20 dBm", "output on", "level -30 dBm"],
            _log);
    }

    [Fact]
    public void Options_OutOfRange_AreAllReportedTogether()
    {
        var options = new InstrumentResilienceOptions { RetryAttempts = 11, OperationTimeout = TimeSpan.Zero, BreakerMinimumThroughput = 1 };

        var ex = Assert.Throws<ArgumentException>(options.Validate);

        Assert.Contains("RetryAttempts", ex.Message);
        Assert.Contains("OperationTimeout", ex.Message);
        Assert.Contains("BreakerMinimumThroughput", ex.Message);
    }
}
