using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The SCPI commands of a simulated network analyser, matching the defaults of the project's SCPI
/// client (<c>ScpiCommandSet</c>) and described in docs/simulator-protocols.md: the sweep
/// (<c>[SENSe#]:FREQuency:STARt|STOP|CENTer|SPAN</c>, <c>[SENSe#]:SWEep:POINts</c>), the IF bandwidth
/// (<c>[SENSe#]:BANDwidth[:RESolution]</c>), averaging (<c>[SENSe#]:AVERage:COUNt</c>,
/// <c>[SENSe#]:AVERage[:STATe]</c>), <c>INITiate[:IMMediate]</c>, <c>TRACe[:DATA]? S11|S21|S12|S22</c>
/// as (real, imaginary) pairs, the FORMat subsystem, <c>*IDN?</c> and <c>*RST</c>.
/// </summary>
public sealed class NetworkAnalyserScpiTree
{
    private readonly ISimulatedNetworkAnalyser _device;
    private readonly ScpiTraceFormat _format = new();
    private int _averageCount;
    private bool _averaging;
    private TraceSet? _lastSweep;

    private NetworkAnalyserScpiTree(ISimulatedNetworkAnalyser device)
    {
        _device = device;
        TakeAveragingFromDevice();
    }

    /// <summary>A SCPI server for <paramref name="device"/>, with its own error queue (or <paramref name="status"/>).</summary>
    public static ScpiServer CreateServer(ISimulatedNetworkAnalyser device, ScpiDeviceStatus? status = null)
    {
        ArgumentNullException.ThrowIfNull(device);
        var tree = new ScpiCommandTree();
        new NetworkAnalyserScpiTree(device).Declare(tree);
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
                TakeAveragingFromDevice();
                _lastSweep = null;
            });

        new ScpiFrequencySpan(
            () => _device.Ranges.StartHertz,
            () => _device.Ranges.StopHertz,
            () => (_device.Start.Hertz, _device.Stop.Hertz),
            (start, stop) => Change(() => _device.SetSweep(Frequency.FromHertz(start), Frequency.FromHertz(stop), _device.Points)))
            .Declare(tree, "[SENSe#]:FREQuency");

        tree.IntegerSetting("[SENSe#]:SWEep:POINts", () => _device.Ranges.Points, () => _device.Points,
                points => Change(() => _device.SetSweep(_device.Start, _device.Stop, points)))
            .NumberSetting("[SENSe#]:BANDwidth[:RESolution]", ScpiUnit.Hertz, () => _device.Ranges.IfBandwidthHertz,
                () => _device.IfBandwidth.Hertz, hertz => Change(() => _device.SetIfBandwidth(Frequency.FromHertz(hertz))))
            .IntegerSetting("[SENSe#]:AVERage:COUNt", () => _device.Ranges.Averages, () => _averageCount, count =>
            {
                if (_averaging)
                {
                    Change(() => _device.SetAverages(count));
                }

                _averageCount = count;
            })
            .SwitchSetting("[SENSe#]:AVERage[:STATe]", () => _averaging, on =>
            {
                Change(() => _device.SetAverages(on ? _averageCount : 1));
                _averaging = on;
            })
            .Command("INITiate[:IMMediate]", c =>
            {
                c.ExpectParameters(0, 0);
                _lastSweep = _device.Sweep();
            })
            .Query("TRACe[:DATA]?", c =>
            {
                c.ExpectParameters(1, 1);
                var quantity = c.Choice(0, ("S11", TraceQuantity.S11), ("S21", TraceQuantity.S21), ("S12", TraceQuantity.S12), ("S22", TraceQuantity.S22));
                if (_lastSweep?.Find(quantity) is not ComplexTrace trace)
                {
                    throw new ScpiCommandException(ScpiStandardErrors.DataStale, $"{c.Header}: no sweep since the settings changed; send INITiate first");
                }

                var values = new double[trace.Count * 2];
                for (int i = 0; i < trace.Count; i++)
                {
                    values[2 * i] = trace.Samples[i].Real;
                    values[2 * i + 1] = trace.Samples[i].Imaginary;
                }

                return _format.Encode(values);
            });

        _format.Declare(tree);
    }

    // A setting accepted by the device makes the last sweep's data stale.
    private void Change(Action apply)
    {
        apply();
        _lastSweep = null;
    }

    private void TakeAveragingFromDevice()
    {
        _averageCount = Math.Max(1, _device.Averages);
        _averaging = _device.Averages > 1;
    }
}
