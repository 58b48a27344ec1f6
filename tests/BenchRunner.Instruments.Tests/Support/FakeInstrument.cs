using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>
/// An in-process instrument that is a network analyser and a signal generator, records every
/// call in <see cref="Log"/> (failed ones too) (shared by all instances a factory makes), and fails on request.
/// </summary>
internal sealed class FakeInstrument(string name, List<string> log) : IInstrument, INetworkAnalyser, ISignalGenerator
{
    /// <summary>Called before each operation with its name; throw from it to make the operation fail.</summary>
    public Action<string>? BeforeOperation { get; set; }

    /// <summary>When set, every acquisition waits on it (to make an operation hang).</summary>
    public Task? Hang { get; set; }

    public List<string> Log { get; } = log;

    public string Name { get; } = name;

    public InstrumentIdentity Identity { get; private set; } = InstrumentIdentity.Unknown;

    public InstrumentLimits Limits => InstrumentLimits.None;

    public bool Disposed { get; private set; }

    public Task ConnectAsync(CancellationToken cancellationToken)
    {
        Step("connect");
        Identity = new InstrumentIdentity("BenchRunner", "Fake", "0001", "1");
        return Task.CompletedTask;
    }

    public T? GetCapability<T>() where T : class => this as T;

    public Task ConfigureSweepAsync(NetworkSweep sweep, CancellationToken cancellationToken)
    {
        Step($"sweep {sweep.Start}..{sweep.Stop}/{sweep.Points}");
        return Task.CompletedTask;
    }

    public async Task<IReadOnlyList<ComplexTrace>> AcquireAsync(IReadOnlyList<TraceQuantity> parameters, CancellationToken cancellationToken)
    {
        Step("acquire");
        if (Hang is { } hang)
        {
            await hang.WaitAsync(cancellationToken);
        }

        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145), 3);
        return parameters.Select(p => new ComplexTrace(axis, p, [new(0.1, 0), new(0.9, 0), new(0.1, 0)])).ToList();
    }

    public Task SetFrequencyAsync(Frequency frequency, CancellationToken cancellationToken) => Done($"frequency {frequency}");

    public Task SetLevelAsync(Level level, CancellationToken cancellationToken) => Done($"level {level}");

    public Task SetOutputAsync(bool on, CancellationToken cancellationToken) => Done(on ? "output on" : "output off");

    public ValueTask DisposeAsync()
    {
        Disposed = true;
        Log.Add("dispose");
        return ValueTask.CompletedTask;
    }

    private Task Done(string what)
    {
        Step(what);
        return Task.CompletedTask;
    }

    private void Step(string what)
    {
        Log.Add(what);
        BeforeOperation?.Invoke(what);
    }
}
