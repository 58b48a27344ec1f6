using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Protocols;

namespace BenchRunner.Simulator.Tests.Support;

/// <summary>
/// A stand-in network analyser for protocol tests: the bench ranges, validated atomic settings, and a
/// device under test that is a series resonator between the ports (centre 137.5 MHz, loaded Q 45):
/// S21 = S12 = 1/(1 + jQ(f/f0 − f0/f)), S11 = S22 = 1 − S21.
/// </summary>
internal sealed class FakeNetworkAnalyser : ISimulatedNetworkAnalyser
{
    public const double CentreHertz = 137.5e6;
    public const double LoadedQ = 45;

    public FakeNetworkAnalyser() => Reset();

    public InstrumentIdentity Identity { get; } = new("benchrunner", "sim-vna", "SIM-VNA-0001", "1.0");

    public NetworkAnalyserRanges Ranges => NetworkAnalyserRanges.Bench;

    public Frequency Start { get; private set; }

    public Frequency Stop { get; private set; }

    public int Points { get; private set; }

    public Frequency IfBandwidth { get; private set; }

    public int Averages { get; private set; }

    /// <summary>How many sweeps were made.</summary>
    public int Sweeps { get; private set; }

    public static Complex S21(double hertz) => 1 / new Complex(1, LoadedQ * (hertz / CentreHertz - CentreHertz / hertz));

    public void SetSweep(Frequency start, Frequency stop, int points)
    {
        Check(start.Hertz, Ranges.StartHertz, nameof(start));
        Check(stop.Hertz, Ranges.StopHertz, nameof(stop));
        Check(points, Ranges.Points, nameof(points));
        if (stop <= start)
        {
            throw new ArgumentOutOfRangeException(nameof(stop), "The stop must be above the start.");
        }

        (Start, Stop, Points) = (start, stop, points);
    }

    public void SetIfBandwidth(Frequency bandwidth)
    {
        Check(bandwidth.Hertz, Ranges.IfBandwidthHertz, nameof(bandwidth));
        IfBandwidth = bandwidth;
    }

    public void SetAverages(int count)
    {
        Check(count, Ranges.Averages, nameof(count));
        Averages = count;
    }

    public void Reset()
    {
        Start = Frequency.FromHertz(Ranges.StartHertz.Default);
        Stop = Frequency.FromHertz(Ranges.StopHertz.Default);
        Points = (int)Ranges.Points.Default;
        IfBandwidth = Frequency.FromHertz(Ranges.IfBandwidthHertz.Default);
        Averages = (int)Ranges.Averages.Default;
    }

    public TraceSet Sweep()
    {
        Sweeps++;
        var axis = FrequencyAxis.Linear(Start, Stop, Points);
        var s21 = axis.Hertz.Select(S21).ToList();
        var s11 = s21.Select(s => 1 - s).ToList();
        return new TraceSet(axis,
        [
            new ComplexTrace(axis, TraceQuantity.S11, s11),
            new ComplexTrace(axis, TraceQuantity.S21, s21),
            new ComplexTrace(axis, TraceQuantity.S12, s21),
            new ComplexTrace(axis, TraceQuantity.S22, s11),
        ]);
    }

    private static void Check(double value, SettingRange range, string name)
    {
        if (!range.Contains(value))
        {
            throw new ArgumentOutOfRangeException(name, value, $"Outside {range.Minimum} to {range.Maximum}.");
        }
    }
}
