using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Simulator.Protocols.Scpi;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Scpi;

// The project's SCPI client (ScpiInstrument with the default command set) against the simulated
// network analyser's SCPI server, over an in-memory pair.
public class NetworkAnalyserScpiTests
{
    private static readonly NetworkSweep PreselectorSweep = new(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 201);

    private readonly FakeNetworkAnalyser _vna = new();

    [Fact]
    public async Task ConnectAsync_ReadsTheIdentity()
    {
        await using var served = ServedDevice.Start(NetworkAnalyserScpiTree.CreateServer(_vna));
        await using var instrument = Client(served);

        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);

        Assert.Equal(new InstrumentIdentity("benchrunner", "sim-vna", "SIM-VNA-0001", "1.0"), instrument.Identity);
    }

    [Theory]
    [InlineData(ScpiDataFormat.Ascii, ScpiByteOrder.Normal, 1e-12)]
    [InlineData(ScpiDataFormat.Real32, ScpiByteOrder.Normal, 1e-7)]
    [InlineData(ScpiDataFormat.Real32, ScpiByteOrder.Swapped, 1e-7)]
    [InlineData(ScpiDataFormat.Real64, ScpiByteOrder.Swapped, 1e-15)]
    public async Task AcquireAsync_S21_ArrivesIntactInEachFormatAndByteOrder(ScpiDataFormat format, ScpiByteOrder order, double tolerance)
    {
        await using var served = ServedDevice.Start(NetworkAnalyserScpiTree.CreateServer(_vna));
        await using var instrument = Client(served, format, order);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var na = instrument.GetCapability<INetworkAnalyser>()!;
        await na.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None).WaitAsync(TestLimits.Await);

        var s21 = Assert.Single(await na.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(TestLimits.Await));

        Assert.Equal(201, s21.Count);
        Assert.Equal(1, _vna.Sweeps);
        // At resonance a series resonator passes everything: S21 = 2Z0/(2Z0 + Z) = 1 with Z = 0
        // (Pozar, Microwave Engineering, Table 4.2); centre point of 127.5 to 147.5 MHz is 137.5 MHz.
        Assert.Equal(137.5e6, s21.Axis.Hertz[100]);
        Assert.Equal(1, s21.Samples[100].Real, 1e-7);
        Assert.Equal(0, s21.Samples[100].Imaginary, 1e-7);
        // |S21| ≤ 1 here, so float32's 24-bit significand (IEEE 754) keeps each part within about 6e-8.
        for (int i = 0; i < s21.Count; i++)
        {
            var expected = FakeNetworkAnalyser.S21(s21.Axis.Hertz[i]);
            Assert.Equal(expected.Real, s21.Samples[i].Real, tolerance);
            Assert.Equal(expected.Imaginary, s21.Samples[i].Imaginary, tolerance);
        }
    }

    [Fact]
    public async Task AcquireAsync_TwoParameters_ComeFromOneSweep()
    {
        await using var served = ServedDevice.Start(NetworkAnalyserScpiTree.CreateServer(_vna));
        await using var instrument = Client(served);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var na = instrument.GetCapability<INetworkAnalyser>()!;
        await na.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None).WaitAsync(TestLimits.Await);

        var traces = await na.AcquireAsync([TraceQuantity.S11, TraceQuantity.S21], CancellationToken.None).WaitAsync(TestLimits.Await);

        Assert.Equal(1, _vna.Sweeps);
        // Series impedance: S11 = Z/(Z + 2Z0) = 1 − S21 (Pozar, Microwave Engineering, Table 4.2).
        for (int i = 0; i < 201; i += 20)
        {
            var sum = traces[0].Samples[i] + traces[1].Samples[i];
            Assert.Equal(1, sum.Real, 1e-6);
            Assert.Equal(0, sum.Imaginary, 1e-6);
        }
    }

    [Fact]
    public async Task ConfigureSweepAsync_IfBandwidthAndAveraging_ReachTheDevice()
    {
        await using var served = ServedDevice.Start(NetworkAnalyserScpiTree.CreateServer(_vna));
        await using var instrument = Client(served);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var na = instrument.GetCapability<INetworkAnalyser>()!;

        await na.ConfigureSweepAsync(new NetworkSweep(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 401,
            Frequency.FromKilohertz(1), averages: 4), CancellationToken.None).WaitAsync(TestLimits.Await);

        Assert.Equal((136e6, 139e6, 401, 1e3, 4), (_vna.Start.Hertz, _vna.Stop.Hertz, _vna.Points, _vna.IfBandwidth.Hertz, _vna.Averages));

        await na.ConfigureSweepAsync(new NetworkSweep(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 401, averages: 1),
            CancellationToken.None).WaitAsync(TestLimits.Await);
        Assert.Equal(1, _vna.Averages);
    }

    [Fact]
    public async Task ConfigureSweepAsync_StopAboveTheRange_IsReportedAsDataOutOfRange()
    {
        await using var served = ServedDevice.Start(NetworkAnalyserScpiTree.CreateServer(_vna));
        await using var instrument = Client(served);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var na = instrument.GetCapability<INetworkAnalyser>()!;

        var e = await Assert.ThrowsAsync<InstrumentReportedException>(() => na.ConfigureSweepAsync(
            new NetworkSweep(Frequency.FromMegahertz(136), Frequency.FromGigahertz(2), 201), CancellationToken.None).WaitAsync(TestLimits.Await));

        // REFERENCES: SCPI-1999 Vol 2 §21.8, -222 "Data out of range".
        Assert.Equal(-222, e.Code);
        Assert.StartsWith("Data out of range", e.Text);
        Assert.Equal("SENSe:FREQuency:STOP 2000000000", e.Command);
        Assert.Equal(SessionState.Ready, instrument.Session.State);
    }

    private static ScpiInstrument Client(ServedDevice served, ScpiDataFormat format = ScpiDataFormat.Real32, ScpiByteOrder order = ScpiByteOrder.Normal) =>
        new("vna", served.Host, new ScpiCommandSet { Network = new() { Enabled = true }, DataFormat = format, ByteOrder = order });
}
