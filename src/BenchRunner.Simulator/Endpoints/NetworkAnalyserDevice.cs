using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.NetworkAnalyser;
using BenchRunner.Simulator.Protocols;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>
/// The network analyser model as the protocol servers see it: one sweep setting at a time,
/// checked against the model's limits (every problem named), all four S-parameters per sweep.
/// </summary>
internal sealed class NetworkAnalyserDevice : ISimulatedNetworkAnalyser
{
    private static readonly TraceQuantity[] All = [TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22];

    private readonly SimulatedNetworkAnalyser _model;
    private readonly NetworkSweep _powerOn;

    public NetworkAnalyserDevice(SimulatedNetworkAnalyser model)
    {
        _model = model;
        var limits = model.Limits;
        _powerOn = new NetworkSweep(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401,
            SimulatedNetworkAnalyser.ReferenceIfBandwidth, 1);
        Ranges = new NetworkAnalyserRanges(
            SettingRange.Of(limits.MinimumFrequency.Hertz, limits.MaximumFrequency.Hertz, _powerOn.Start.Hertz, step: 1),
            SettingRange.Of(limits.MinimumFrequency.Hertz, limits.MaximumFrequency.Hertz, _powerOn.Stop.Hertz, step: 1),
            SettingRange.Of(limits.MinimumPoints, limits.MaximumPoints, _powerOn.Points, step: 1),
            SettingRange.Of(limits.MinimumIfBandwidth.Hertz, limits.MaximumIfBandwidth.Hertz, _powerOn.IfBandwidth!.Value.Hertz, step: 1),
            SettingRange.Of(1, limits.MaximumAverages, 1, step: 1));
        Reset();
    }

    public InstrumentIdentity Identity => _model.Identity;

    public NetworkAnalyserRanges Ranges { get; }

    public Frequency Start => _model.Settings.Start;

    public Frequency Stop => _model.Settings.Stop;

    public int Points => _model.Settings.Points;

    public Frequency IfBandwidth => _model.Settings.IfBandwidth ?? SimulatedNetworkAnalyser.ReferenceIfBandwidth;

    public int Averages => _model.Settings.Averages ?? 1;

    public void SetSweep(Frequency start, Frequency stop, int points) =>
        Apply(new NetworkSweep(start, stop, points, IfBandwidth, Averages));

    public void SetIfBandwidth(Frequency bandwidth) =>
        Apply(new NetworkSweep(Start, Stop, Points, bandwidth, Averages));

    public void SetAverages(int count)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        Apply(new NetworkSweep(Start, Stop, Points, IfBandwidth, count));
    }

    public void Reset() => _model.Configure(_powerOn);

    public TraceSet Sweep()
    {
        var traces = _model.Sweep(All);
        return new TraceSet(traces[0].Axis, traces, SimulatedNetworkAnalyser.PortOhms);
    }

    private void Apply(NetworkSweep sweep)
    {
        var problems = _model.Validate(sweep);
        if (problems.Count > 0)
        {
            throw new ArgumentOutOfRangeException(nameof(sweep), string.Join("; ", problems));
        }

        _model.Configure(sweep);
    }
}
