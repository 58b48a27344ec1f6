namespace BenchRunner.Simulator.Protocols;

/// <summary>The settings a simulated network analyser accepts.</summary>
/// <param name="StartHertz">The sweep's first frequency, in hertz.</param>
/// <param name="StopHertz">The sweep's last frequency, in hertz (always above the start).</param>
/// <param name="Points">The number of points.</param>
/// <param name="IfBandwidthHertz">The IF (receiver) bandwidth, in hertz.</param>
/// <param name="Averages">How many sweeps are averaged (1 for none).</param>
public sealed record NetworkAnalyserRanges(
    SettingRange StartHertz,
    SettingRange StopHertz,
    SettingRange Points,
    SettingRange IfBandwidthHertz,
    SettingRange Averages)
{
    /// <summary>
    /// The bench network analyser's ranges, those of docs/simulator-dialect.md: 100 kHz to 1.5 GHz
    /// in whole hertz (full span at power-on), 2 to 1601 points (201), IF bandwidth 10 Hz to
    /// 100 kHz (1 kHz), 1 to 100 sweeps averaged (1).
    /// </summary>
    public static NetworkAnalyserRanges Bench { get; } = new(
        SettingRange.Of(100e3, 1.5e9, 100e3, step: 1),
        SettingRange.Of(100e3, 1.5e9, 1.5e9, step: 1),
        SettingRange.Of(2, 1601, 201, step: 1),
        SettingRange.Of(10, 100e3, 1e3, step: 1),
        SettingRange.Of(1, 100, 1, step: 1));
}
