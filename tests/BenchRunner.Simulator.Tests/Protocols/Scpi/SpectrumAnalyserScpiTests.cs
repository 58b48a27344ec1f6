using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Simulator.Protocols.Scpi;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Scpi;

// The project's SCPI client against the simulated spectrum analyser's SCPI server.
public class SpectrumAnalyserScpiTests
{
    private static readonly SpectrumSettings Passband = new(
        FrequencyRange.Between(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139)),
        Frequency.FromKilohertz(30), Ratio.FromDecibels(20), Level.FromDbm(-10), Points: 301);

    private readonly FakeSpectrumAnalyser _sa = new();

    [Theory]
    [InlineData(ScpiDataFormat.Real32, ScpiByteOrder.Normal)]
    [InlineData(ScpiDataFormat.Real32, ScpiByteOrder.Swapped)]
    [InlineData(ScpiDataFormat.Ascii, ScpiByteOrder.Normal)]
    public async Task ConfigureAndAcquire_SetsEverySetting_AndReturnsTheScreen(ScpiDataFormat format, ScpiByteOrder order)
    {
        await using var served = ServedDevice.Start(SpectrumAnalyserScpiTree.CreateServer(_sa));
        await using var instrument = Client(served, format, order);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var sa = instrument.GetCapability<ISpectrumAnalyser>()!;

        await sa.ConfigureAsync(Passband, CancellationToken.None).WaitAsync(TestLimits.Await);
        var trace = await sa.AcquireAsync(CancellationToken.None).WaitAsync(TestLimits.Await);

        Assert.Equal((136e6, 139e6, 301, 30e3, 20.0, -10.0),
            (_sa.Start.Hertz, _sa.Stop.Hertz, _sa.Points, _sa.ResolutionBandwidth.Hertz, _sa.InputAttenuation.Decibels, _sa.ReferenceLevel.Dbm));
        Assert.Equal(301, trace.Count);
        // 136 to 139 MHz in 301 points is 10 kHz a step; point 150 is the tone at 137.5 MHz.
        Assert.Equal(137.5e6, trace.Axis.Hertz[150], 1e-3);
        // Levels of -90 to -30 dBm keep 1e-5 dB in float32 (24-bit significand, IEEE 754).
        Assert.Equal(FakeSpectrumAnalyser.ToneDbm, trace.LevelsDb[150], 1e-5);
        for (int i = 0; i < trace.Count; i++)
        {
            Assert.Equal(_sa.LevelAt(trace.Axis.Hertz[i]), trace.LevelsDb[i], 1e-5);
        }
    }

    [Fact]
    public async Task AcquireAsync_PointsLeftToTheInstrument_AreAskedFor()
    {
        await using var served = ServedDevice.Start(SpectrumAnalyserScpiTree.CreateServer(_sa));
        await using var instrument = Client(served);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var sa = instrument.GetCapability<ISpectrumAnalyser>()!;

        await sa.ConfigureAsync(Passband with { Points = null }, CancellationToken.None).WaitAsync(TestLimits.Await);
        var trace = await sa.AcquireAsync(CancellationToken.None).WaitAsync(TestLimits.Await);

        // 401 points at power-on (docs/simulator-dialect.md).
        Assert.Equal(401, trace.Count);
    }

    [Fact]
    public async Task ConfigureAsync_AttenuationAboveFiftyDb_IsReportedAsDataOutOfRange()
    {
        await using var served = ServedDevice.Start(SpectrumAnalyserScpiTree.CreateServer(_sa));
        await using var instrument = Client(served);
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(TestLimits.Await);
        var sa = instrument.GetCapability<ISpectrumAnalyser>()!;

        var e = await Assert.ThrowsAsync<InstrumentReportedException>(() =>
            sa.ConfigureAsync(Passband with { InputAttenuation = Ratio.FromDecibels(60) }, CancellationToken.None).WaitAsync(TestLimits.Await));

        Assert.Equal(-222, e.Code);
        Assert.Equal("INPut:ATTenuation 60", e.Command);
        Assert.Equal(10, _sa.InputAttenuation.Decibels);
    }

    private static ScpiInstrument Client(ServedDevice served, ScpiDataFormat format = ScpiDataFormat.Real32, ScpiByteOrder order = ScpiByteOrder.Normal) =>
        new("sa", served.Host, new ScpiCommandSet { Spectrum = new() { Enabled = true }, DataFormat = format, ByteOrder = order });
}
