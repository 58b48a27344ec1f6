using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The SCPI commands of a simulated spectrum analyser, matching the defaults of the project's SCPI
/// client (<c>ScpiCommandSet</c>) and described in docs/simulator-protocols.md: the span
/// (<c>[SENSe#]:FREQuency:STARt|STOP|CENTer|SPAN</c>), <c>[SENSe#]:SWEep:POINts</c>, the RBW
/// (<c>[SENSe#]:BANDwidth[:RESolution]</c>), <c>INPut#:ATTenuation</c>, the reference level
/// (<c>DISPlay[:WINDow#]:TRACe#:Y[:SCALe]:RLEVel</c>), <c>INITiate[:IMMediate]</c>,
/// <c>TRACe[:DATA]? POWer</c> in dBm, the FORMat subsystem, <c>*IDN?</c> and <c>*RST</c>.
/// </summary>
public sealed class SpectrumAnalyserScpiTree
{
    private readonly ISimulatedSpectrumAnalyser _device;
    private readonly ScpiTraceFormat _format = new();
    private PowerTrace? _lastSweep;

    private SpectrumAnalyserScpiTree(ISimulatedSpectrumAnalyser device) => _device = device;

    /// <summary>A SCPI server for <paramref name="device"/>, with its own error queue (or <paramref name="status"/>).</summary>
    public static ScpiServer CreateServer(ISimulatedSpectrumAnalyser device, ScpiDeviceStatus? status = null)
    {
        ArgumentNullException.ThrowIfNull(device);
        var tree = new ScpiCommandTree();
        new SpectrumAnalyserScpiTree(device).Declare(tree);
        return new ScpiServer(tree, status);
    }

    private void Declare(ScpiCommandTree tree)
    {
        tree.Identification(_device.Identity)
            .Command("*RST", c =>
            {
                c.ExpectParameters(0, 0);
                _device.Reset();
                _format.Reset();
                _lastSweep = null;
            });

        new ScpiFrequencySpan(
            () => _device.Ranges.StartHertz,
            () => _device.Ranges.StopHertz,
            () => (_device.Start.Hertz, _device.Stop.Hertz),
            (start, stop) => Change(() => _device.SetSpan(Frequency.FromHertz(start), Frequency.FromHertz(stop))))
            .Declare(tree, "[SENSe#]:FREQuency");

        tree.IntegerSetting("[SENSe#]:SWEep:POINts", () => _device.Ranges.Points, () => _device.Points,
                points => Change(() => _device.SetPoints(points)))
            .NumberSetting("[SENSe#]:BANDwidth[:RESolution]", ScpiUnit.Hertz, () => _device.Ranges.ResolutionBandwidthHertz,
                () => _device.ResolutionBandwidth.Hertz, hertz => Change(() => _device.SetResolutionBandwidth(Frequency.FromHertz(hertz))))
            .NumberSetting("INPut#:ATTenuation", ScpiUnit.Decibel, () => _device.Ranges.InputAttenuationDb,
                () => _device.InputAttenuation.Decibels, db => Change(() => _device.SetInputAttenuation(Ratio.FromDecibels(db))))
            .NumberSetting("DISPlay[:WINDow#]:TRACe#:Y[:SCALe]:RLEVel", ScpiUnit.DecibelMilliwatt, () => _device.Ranges.ReferenceLevelDbm,
                () => _device.ReferenceLevel.Dbm, dbm => Change(() => _device.SetReferenceLevel(Level.FromDbm(dbm))))
            .Command("INITiate[:IMMediate]", c =>
            {
                c.ExpectParameters(0, 0);
                _lastSweep = _device.Sweep();
            })
            .Query("TRACe[:DATA]?", c =>
            {
                c.ExpectParameters(1, 1);
                c.Choice(0, ("POWer", TraceQuantity.Power));
                var trace = _lastSweep
                    ?? throw new ScpiCommandException(ScpiStandardErrors.DataStale, $"{c.Header}: no sweep since the settings changed; send INITiate first");
                return _format.Encode(trace.LevelsDb);
            });

        _format.Declare(tree);
    }

    // A setting accepted by the device makes the last sweep's data stale.
    private void Change(Action apply)
    {
        apply();
        _lastSweep = null;
    }
}
