using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Simulator.Protocols.Scpi;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Scpi;

// The project's SCPI client against the simulated signal generator's SCPI server.
public class SignalGeneratorScpiTests
{
    private readonly FakeSignalGenerator _generator = new();

    [Fact]
    public async Task Settings_ReachTheGenerator()
    {
        await using var served = ServedDevice.Start(SignalGeneratorScpiTree.CreateServer(_generator));
        await using var instrument = Client(served);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var generator = instrument.GetCapability<ISignalGenerator>()!;

        await generator.SetFrequencyAsync(Frequency.FromMegahertz(137.5), CancellationToken.None).WaitAsync(TestLimits.Await);
        await generator.SetLevelAsync(Level.FromDbm(-20.5), CancellationToken.None).WaitAsync(TestLimits.Await);
        await generator.SetOutputAsync(true, CancellationToken.None).WaitAsync(TestLimits.Await);

        Assert.Equal(new InstrumentIdentity("benchrunner", "sim-gen", "SIM-GEN-0001", "1.0"), instrument.Identity);
        Assert.Equal(137.5e6, _generator.Frequency.Hertz);
        Assert.Equal(-20.5, _generator.Level.Dbm);
        Assert.True(_generator.OutputOn);

        await generator.SetOutputAsync(false, CancellationToken.None).WaitAsync(TestLimits.Await);
        Assert.False(_generator.OutputOn);
    }

    [Fact]
    public async Task SetLevelAsync_AboveZeroDbm_IsReportedAsDataOutOfRange_AndChangesNothing()
    {
        await using var served = ServedDevice.Start(SignalGeneratorScpiTree.CreateServer(_generator));
        await using var instrument = Client(served);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var generator = instrument.GetCapability<ISignalGenerator>()!;
        await generator.SetLevelAsync(Level.FromDbm(-20), CancellationToken.None).WaitAsync(TestLimits.Await);

        var e = await Assert.ThrowsAsync<InstrumentReportedException>(() =>
            generator.SetLevelAsync(Level.FromDbm(5), CancellationToken.None).WaitAsync(TestLimits.Await));

        // REFERENCES: SCPI-1999 Vol 2 §21.8, -222 "Data out of range".
        Assert.Equal(-222, e.Code);
        Assert.StartsWith("Data out of range", e.Text);
        Assert.Equal("SOURce:POWer 5", e.Command);
        Assert.False(e.IsTransient);
        Assert.Equal(-20, _generator.Level.Dbm);
    }

    private static ScpiInstrument Client(ServedDevice served) =>
        new("gen", served.Host, new ScpiCommandSet { Generator = new() { Enabled = true } });
}
