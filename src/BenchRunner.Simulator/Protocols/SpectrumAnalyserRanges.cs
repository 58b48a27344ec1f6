namespace BenchRunner.Simulator.Protocols;

/// <summary>The settings a simulated spectrum analyser accepts.</summary>
/// <param name="StartHertz">The span's first frequency, in hertz.</param>
/// <param name="StopHertz">The span's last frequency, in hertz (always above the start).</param>
/// <param name="Points">The number of trace points.</param>
/// <param name="ResolutionBandwidthHertz">The resolution bandwidth (RBW), in hertz.</param>
/// <param name="InputAttenuationDb">The input attenuation, in dB.</param>
/// <param name="ReferenceLevelDbm">The reference level (top of the screen), in dBm.</param>
public sealed record SpectrumAnalyserRanges(
    SettingRange StartHertz,
    SettingRange StopHertz,
    SettingRange Points,
    SettingRange ResolutionBandwidthHertz,
    SettingRange InputAttenuationDb,
    SettingRange ReferenceLevelDbm)
{
    /// <summary>
    /// The bench spectrum analyser's ranges, those of docs/simulator-dialect.md: 100 kHz to
    /// 1.5 GHz in whole hertz (full span at power-on), 11 to 4001 points (401 at power-on), RBW
    /// 100 Hz to 3 MHz (10 kHz), attenuation 0 to 50 dB in whole decibels (10 dB), reference
    /// level −100 to +20 dBm (0 dBm).
    /// </summary>
    public static SpectrumAnalyserRanges Bench { get; } = new(
        SettingRange.Of(100e3, 1.5e9, 100e3, step: 1),
        SettingRange.Of(100e3, 1.5e9, 1.5e9, step: 1),
        SettingRange.Of(11, 4001, 401, step: 1),
        SettingRange.Of(100, 3e6, 10e3, step: 1),
        SettingRange.Of(0, 50, 10, step: 1),
        SettingRange.Of(-100, 20, 0));
}
