using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// The invented scene of the demo workshop: a weather-satellite-like FM downlink near 137.5 MHz
/// and a few interferers, with levels as they arrive at the analyser's input after the
/// station's front end. docs/simulator-spectrum.md lists them.
/// </summary>
public static class DemoScene
{
    /// <summary>The downlink's carrier frequency: 137.5 MHz.</summary>
    public static Frequency DownlinkFrequency { get; } = Frequency.FromMegahertz(137.5);

    /// <summary>The downlink's peak deviation: 14.6 kHz.</summary>
    public static Frequency DownlinkDeviation { get; } = Frequency.FromKilohertz(14.6);

    /// <summary>The downlink's modulating (subcarrier) frequency: 2.4 kHz; Carson bandwidth 2(14.6 + 2.4) = 34 kHz.</summary>
    public static Frequency DownlinkModulatingFrequency { get; } = Frequency.FromKilohertz(2.4);

    /// <summary>The downlink's level at the analyser input: −70 dBm.</summary>
    public static Level DownlinkLevel { get; } = Level.FromDbm(-70);

    /// <summary>
    /// The scene: <c>downlink</c> (FM, 137.5 MHz, −70 dBm, 34 kHz wide), <c>beacon</c> (CW,
    /// 136.2 MHz, −62 dBm), <c>narrowband-fm</c> (FM, 138.35 MHz, −75 dBm, 2.5 kHz deviation with
    /// 1 kHz tone), <c>wideband-fm</c> (FM, 100 MHz, −35 dBm, 75 kHz deviation with 15 kHz tone) and
    /// <c>strong-cw</c> (CW, 68.9 MHz, −15 dBm), whose second harmonic, made inside the analyser's
    /// mixer, lands at 137.8 MHz and falls by 10 dB for each 10 dB of added input attenuation.
    /// </summary>
    public static Scene Create() => new([
        new SceneSignal("downlink", Emission.Fm(DownlinkFrequency, DownlinkLevel, DownlinkDeviation, DownlinkModulatingFrequency)),
        new SceneSignal("beacon", Emission.Cw(Frequency.FromMegahertz(136.2), Level.FromDbm(-62))),
        new SceneSignal("narrowband-fm", Emission.Fm(Frequency.FromMegahertz(138.35), Level.FromDbm(-75), Frequency.FromKilohertz(2.5), Frequency.FromKilohertz(1))),
        new SceneSignal("wideband-fm", Emission.Fm(Frequency.FromMegahertz(100), Level.FromDbm(-35), Frequency.FromKilohertz(75), Frequency.FromKilohertz(15))),
        new SceneSignal("strong-cw", Emission.Cw(Frequency.FromMegahertz(68.9), Level.FromDbm(-15))),
    ]);
}
