using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Protocols;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>
/// The spectrum analyser model as the protocol servers see it. Like a real analyser it takes
/// the nearest resolution bandwidth and attenuator step it has (the query then tells which),
/// and refuses values outside its ranges without changing anything.
/// </summary>
internal sealed class SpectrumAnalyserDevice : ISimulatedSpectrumAnalyser
{
    private static readonly SpectrumSettings PowerOn = new(
        FrequencyRange.Between(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139)),
        Frequency.FromKilohertz(10), Ratio.FromDecibels(10), Level.FromDbm(0), SimulatedSpectrumAnalyser.DefaultPoints);

    private readonly SimulatedSpectrumAnalyser _model;

    public SpectrumAnalyserDevice(SimulatedSpectrumAnalyser model)
    {
        _model = model;
        var band = SimulatedSpectrumAnalyser.FrequencyRange;
        var rbw = SimulatedSpectrumAnalyser.ResolutionBandwidths;
        var attenuation = SimulatedSpectrumAnalyser.AttenuationSteps;
        Ranges = new SpectrumAnalyserRanges(
            SettingRange.Of(band.Start.Hertz, band.Stop.Hertz, PowerOn.Span.Start.Hertz, step: 1),
            SettingRange.Of(band.Start.Hertz, band.Stop.Hertz, PowerOn.Span.Stop.Hertz, step: 1),
            SettingRange.Of(11, 4001, SimulatedSpectrumAnalyser.DefaultPoints, step: 1),
            SettingRange.Of(rbw[0].Hertz, rbw[^1].Hertz, PowerOn.ResolutionBandwidth.Hertz),
            SettingRange.Of(attenuation[0].Decibels, attenuation[^1].Decibels, PowerOn.InputAttenuation.Decibels),
            SettingRange.Of(SimulatedSpectrumAnalyser.LowestReferenceLevel.Dbm, SimulatedSpectrumAnalyser.HighestReferenceLevel.Dbm, PowerOn.ReferenceLevel.Dbm));
        Reset();
    }

    public InstrumentIdentity Identity => _model.Identity;

    public SpectrumAnalyserRanges Ranges { get; }

    public Frequency Start => _model.Span.Start;

    public Frequency Stop => _model.Span.Stop;

    public int Points => _model.Points;

    public Frequency ResolutionBandwidth => _model.ResolutionBandwidth;

    public Ratio InputAttenuation => _model.InputAttenuation;

    public Level ReferenceLevel => _model.ReferenceLevel;

    public void SetSpan(Frequency start, Frequency stop) => _model.SetSpan(start, stop);

    public void SetPoints(int points)
    {
        Check(Ranges.Points, points, "points");
        _model.Points = points;
    }

    public void SetResolutionBandwidth(Frequency bandwidth)
    {
        Check(Ranges.ResolutionBandwidthHertz, bandwidth.Hertz, "resolution bandwidth (Hz)");
        _model.ResolutionBandwidth = SimulatedSpectrumAnalyser.NearestResolutionBandwidth(bandwidth);
    }

    public void SetInputAttenuation(Ratio attenuation)
    {
        Check(Ranges.InputAttenuationDb, attenuation.Decibels, "input attenuation (dB)");
        _model.InputAttenuation = SimulatedSpectrumAnalyser.AttenuationSteps
            .MinBy(step => Math.Abs(step.Decibels - attenuation.Decibels));
    }

    public void SetReferenceLevel(Level level) => _model.ReferenceLevel = level;

    public void Reset() => _model.Configure(PowerOn);

    public PowerTrace Sweep() => _model.Sweep();

    private static void Check(SettingRange range, double value, string what)
    {
        if (!range.Contains(value))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, $"The {what} must be {range.Minimum} to {range.Maximum}.");
        }
    }
}
