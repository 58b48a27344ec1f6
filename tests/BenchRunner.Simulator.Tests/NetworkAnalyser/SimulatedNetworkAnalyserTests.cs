using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.NetworkAnalyser;

namespace BenchRunner.Simulator.Tests.NetworkAnalyser;

public class SimulatedNetworkAnalyserTests
{
    private static readonly NetworkSweep PreselectorSweep = new(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401);

    private static SimulatedNetworkAnalyser Analyser(NetworkAnalyserOptions? options = null)
    {
        var analyser = new SimulatedNetworkAnalyser(options);
        analyser.Configure(PreselectorSweep);
        return analyser;
    }

    /// <summary>The rms magnitude of a trace's samples, in dB.</summary>
    private static double RmsDb(ComplexTrace trace) =>
        10 * Math.Log10(trace.Samples.Average(s => s.Magnitude * s.Magnitude));

    [Fact]
    public void Identity_NamesTheSimulator()
    {
        var analyser = new SimulatedNetworkAnalyser(new NetworkAnalyserOptions { Serial = "SV-0042", Firmware = "2.1" });

        Assert.Equal(new InstrumentIdentity("BenchRunner", "SIM-VNA", "SV-0042", "2.1"), analyser.Identity);
        Assert.Equal(FrequencyRange.Between(Frequency.FromMegahertz(1), Frequency.FromGigahertz(1.5)), analyser.Limits.ToInstrumentLimits().FrequencyRange);
    }

    [Fact]
    public void New_SweepsTheWholeRangeAtTenKilohertzWithNothingConnected()
    {
        var analyser = new SimulatedNetworkAnalyser();

        Assert.Equal(Frequency.FromMegahertz(1), analyser.Settings.Start);
        Assert.Equal(Frequency.FromGigahertz(1.5), analyser.Settings.Stop);
        Assert.Equal(201, analyser.Axis.Count);
        Assert.Equal(Frequency.FromKilohertz(10), analyser.Settings.IfBandwidth);
        Assert.Same(OpenPorts.Instance, analyser.DeviceUnderTest);
    }

    [Fact]
    public void Configure_OutsideTheLimits_ReportsEveryProblemTogether()
    {
        var analyser = new SimulatedNetworkAnalyser();
        var bad = new NetworkSweep(Frequency.FromKilohertz(500), Frequency.FromGigahertz(2), 5, Frequency.FromMegahertz(1), 5000);

        var problems = analyser.Validate(bad);
        var error = Assert.Throws<ArgumentException>(() => analyser.Configure(bad));

        Assert.Equal(5, problems.Count);
        Assert.All(problems, p => Assert.Contains(p, error.Message));
        Assert.Equal(201, analyser.Settings.Points);
    }

    [Fact]
    public void Configure_WithoutIfBandwidthOrAverages_KeepsTheCurrentOnes()
    {
        var analyser = new SimulatedNetworkAnalyser();
        analyser.Configure(new NetworkSweep(Frequency.FromMegahertz(100), Frequency.FromMegahertz(200), 11, Frequency.FromKilohertz(1), 4));

        analyser.Configure(PreselectorSweep);

        Assert.Equal(Frequency.FromKilohertz(1), analyser.Settings.IfBandwidth);
        Assert.Equal(4, analyser.Settings.Averages);
        Assert.Equal(401, analyser.Axis.Count);
        Assert.Equal(127.5e6, analyser.Axis.Hertz[0]);
    }

    [Fact]
    public void Sweep_NothingConnected_ShowsOpenPortsAndTheNoiseFloor()
    {
        var analyser = Analyser();

        var traces = analyser.Sweep([TraceQuantity.S11, TraceQuantity.S21]);

        Assert.InRange(traces[0].LevelsDb.Min(), -0.05, 0.05);
        Assert.Equal(-90, RmsDb(traces[1]), 1.5);
        Assert.Equal(-90, analyser.NoiseFloorDb, 9);
    }

    [Theory]
    [InlineData(1_000, 1, -100)]
    [InlineData(100_000, 1, -80)]
    [InlineData(10_000, 100, -110)]
    public void NoiseFloor_FollowsRootIfBandwidthAndFallsWithRootAverages(double ifHertz, int averages, double expectedDb)
    {
        // Noise power in the IF filter is proportional to its bandwidth (kTB: ThermalNoise), so the rms
        // noise voltage goes as √IFBW; averaging N independent sweeps divides it by √N (common practice, no source).
        var analyser = new SimulatedNetworkAnalyser();
        analyser.Configure(new NetworkSweep(PreselectorSweep.Start, PreselectorSweep.Stop, 1001, Frequency.FromHertz(ifHertz), averages));

        var s21 = analyser.Sweep([TraceQuantity.S21])[0];

        Assert.Equal(expectedDb, analyser.NoiseFloorDb, 9);
        Assert.Equal(expectedDb, RmsDb(s21), 1.0);
    }

    [Fact]
    public void Sweep_Preselector_ShowsItsResponseWithTraceNoise()
    {
        var analyser = Analyser();
        var board = Preselector137.TunedBoard();
        analyser.DeviceUnderTest = board;

        var measured = (ComplexTrace)analyser.Sweep([TraceQuantity.S21])[0];
        var exact = (ComplexTrace)board.Sweep(analyser.Axis, [TraceQuantity.S21])[0];

        int centre = 200;
        Assert.NotEqual(exact.Samples[centre], measured.Samples[centre]);
        Assert.Equal(exact.LevelsDb[centre], measured.LevelsDb[centre], 0.05);
        Assert.All(Enumerable.Range(0, exact.Count), i => Assert.Equal(exact.LevelsDb[i], measured.LevelsDb[i], 1.0));
    }

    [Fact]
    public void Sweep_NoiseDisabled_GivesTheExactResponse()
    {
        var analyser = Analyser(new NetworkAnalyserOptions { NoiseEnabled = false });
        var lna = new LowNoiseAmplifier();
        analyser.DeviceUnderTest = lna;

        var measured = analyser.Sweep([TraceQuantity.S22, TraceQuantity.S21]);
        var exact = lna.Sweep(analyser.Axis, [TraceQuantity.S22, TraceQuantity.S21]);

        Assert.Equal([TraceQuantity.S22, TraceQuantity.S21], measured.Select(t => t.Quantity));
        Assert.True(measured[0].Samples.SequenceEqual(exact[0].Samples));
        Assert.True(measured[1].Samples.SequenceEqual(exact[1].Samples));
    }

    [Fact]
    public void Sweep_SameSeed_GivesIdenticalTraces_DifferentSeedDifferentOnes()
    {
        ComplexTrace Run(long seed)
        {
            var analyser = Analyser(new NetworkAnalyserOptions { Seed = seed });
            analyser.DeviceUnderTest = Preselector137.TunedBoard();
            analyser.Sweep([TraceQuantity.S21]);
            return analyser.Sweep([TraceQuantity.S21])[0];
        }

        Assert.True(Run(7).Samples.SequenceEqual(Run(7).Samples));
        Assert.False(Run(7).Samples.SequenceEqual(Run(8).Samples));
    }

    [Fact]
    public void Sweep_TwoSweepsInARow_DrawFreshNoise()
    {
        var analyser = Analyser();

        var first = analyser.Sweep([TraceQuantity.S21])[0];
        var second = analyser.Sweep([TraceQuantity.S21])[0];

        Assert.False(first.Samples.SequenceEqual(second.Samples));
        Assert.Equal(2, analyser.SweepCount);
    }

    [Fact]
    public void Sweep_PowerOrNothing_IsRefused()
    {
        var analyser = Analyser();

        Assert.Throws<ArgumentException>(() => analyser.Sweep([TraceQuantity.Power]));
        Assert.Throws<ArgumentException>(() => analyser.Sweep([]));
    }

    [Fact]
    public void Sweep_TimeVaryingDevice_IsSnapshotOncePerSweep()
    {
        var analyser = Analyser(new NetworkAnalyserOptions { NoiseEnabled = false });
        var device = new CountingDevice();
        analyser.DeviceUnderTest = device;

        analyser.Sweep([TraceQuantity.S21]);
        analyser.Sweep([TraceQuantity.S21]);

        Assert.Equal(2, device.Snapshots);
    }

    [Fact]
    public void DeviceUnderTest_SetToNull_DisconnectsIt()
    {
        var analyser = Analyser();
        analyser.DeviceUnderTest = new LowNoiseAmplifier();

        analyser.DeviceUnderTest = null!;

        Assert.Same(OpenPorts.Instance, analyser.DeviceUnderTest);
    }

    [Fact]
    public void SweepDuration_IsOneSettlingTimePerPointAndAverage()
    {
        var analyser = new SimulatedNetworkAnalyser();
        analyser.Configure(new NetworkSweep(PreselectorSweep.Start, PreselectorSweep.Stop, 401, Frequency.FromKilohertz(1), 3));

        Assert.Equal(TimeSpan.FromSeconds(401 * 3 / 1000.0), analyser.SweepDuration);
    }

    private sealed class CountingDevice : ITimeVaryingTwoPort
    {
        public int Snapshots { get; private set; }

        public ITwoPort Snapshot()
        {
            Snapshots++;
            return this;
        }

        public SParameters Evaluate(double hertz, double referenceOhms) => new(Complex.Zero, Complex.One, Complex.One, Complex.Zero);
    }
}
