namespace BenchRunner.Simulator.Protocols;

/// <summary>The settings a simulated signal generator accepts.</summary>
/// <param name="FrequencyHertz">The carrier frequency, in hertz.</param>
/// <param name="LevelDbm">The output level, in dBm.</param>
public sealed record SignalGeneratorRanges(SettingRange FrequencyHertz, SettingRange LevelDbm)
{
    /// <summary>
    /// The bench signal generator's ranges, those of docs/simulator-dialect.md: 0.1 to 1500 MHz
    /// in steps of 1 Hz (100 MHz at power-on), −80 to 0 dBm in steps of 0.001 dB (−80 dBm, the
    /// lowest, at power-on).
    /// </summary>
    public static SignalGeneratorRanges Bench { get; } = new(
        SettingRange.Of(100e3, 1.5e9, 100e6, step: 1),
        SettingRange.Of(-80, 0, -80, step: 0.001));
}
