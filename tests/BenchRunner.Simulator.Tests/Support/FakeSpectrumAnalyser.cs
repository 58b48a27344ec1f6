using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Protocols;

namespace BenchRunner.Simulator.Tests.Support;

/// <summary>
/// A stand-in spectrum analyser for protocol tests: the bench ranges, validated settings, and a
/// screen showing a −30 dBm tone at 137.5 MHz above a −90 dBm floor; the tone's skirt falls 3.0103 dB
/// at half an RBW from it and the trace is never below the floor.
/// </summary>
internal sealed class FakeSpectrumAnalyser : ISimulatedSpectrumAnalyser
{
    public const double ToneHertz = 137.5e6;
    public const double ToneDbm = -30;
    public const double FloorDbm = -90;

    public FakeSpectrumAnalyser() => Reset();

    public InstrumentIdentity Identity { get; } = new("benchrunner", "sim-sa", "SIM-SA-0001", "1.0");

    public SpectrumAnalyserRanges Ranges => SpectrumAnalyserRanges.Bench;

    public Frequency Start { get; private set; }

    public Frequency Stop { get; private set; }

    public int Points { get; private set; }

    public Frequency ResolutionBandwidth { get; private set; }

    public Ratio InputAttenuation { get; private set; }

    public Level ReferenceLevel { get; private set; }

    public double LevelAt(double hertz)
    {
        var offset = (hertz - ToneHertz) / (ResolutionBandwidth.Hertz / 2);
        return Math.Max(FloorDbm, ToneDbm - 10 * Math.Log10(2) * offset * offset);
    }

    public void SetSpan(Frequency start, Frequency stop)
    {
        Check(start.Hertz, Ranges.StartHertz, nameof(start));
        Check(stop.Hertz, Ranges.StopHertz, nameof(stop));
        if (stop <= start)
        {
            throw new ArgumentOutOfRangeException(nameof(stop), "The stop must be above the start.");
        }

        (Start, Stop) = (start, stop);
    }

    public void SetPoints(int points)
    {
        Check(points, Ranges.Points, nameof(points));
        Points = points;
    }

    public void SetResolutionBandwidth(Frequency bandwidth)
    {
        Check(bandwidth.Hertz, Ranges.ResolutionBandwidthHertz, nameof(bandwidth));
        ResolutionBandwidth = bandwidth;
    }

    public void SetInputAttenuation(Ratio attenuation)
    {
        Check(attenuation.Decibels, Ranges.InputAttenuationDb, nameof(attenuation));
        InputAttenuation = attenuation;
    }

    public void SetReferenceLevel(Level level)
    {
        Check(level.Dbm, Ranges.ReferenceLevelDbm, nameof(level));
        ReferenceLevel = level;
    }

    public void Reset()
    {
        Start = Frequency.FromHertz(Ranges.StartHertz.Default);
        Stop = Frequency.FromHertz(Ranges.StopHertz.Default);
        Points = (int)Ranges.Points.Default;
        ResolutionBandwidth = Frequency.FromHertz(Ranges.ResolutionBandwidthHertz.Default);
        InputAttenuation = Ratio.FromDecibels(Ranges.InputAttenuationDb.Default);
        ReferenceLevel = Level.FromDbm(Ranges.ReferenceLevelDbm.Default);
    }

    public PowerTrace Sweep()
    {
        var axis = FrequencyAxis.Linear(Start, Stop, Points);
        return new PowerTrace(axis, axis.Hertz.Select(LevelAt));
    }

    private static void Check(double value, SettingRange range, string name)
    {
        if (!range.Contains(value))
        {
            throw new ArgumentOutOfRangeException(name, value, $"Outside {range.Minimum} to {range.Maximum}.");
        }
    }
}
