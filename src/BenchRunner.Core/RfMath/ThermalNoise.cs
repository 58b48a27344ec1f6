using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.RfMath;

/// <summary>
/// Thermal noise available from a matched resistor: N = k·T·B watts, so
/// N[dBm] = 10·log10(k·T / 1 mW) + 10·log10(B / 1 Hz); about −174 dBm/Hz at 290 K.
/// A receiver with noise figure NF shows a floor of kTB + NF (in dB).
/// </summary>
public static class ThermalNoise
{
    /// <summary>The Boltzmann constant k in J/K, exact in the SI since 2019.</summary>
    public const double BoltzmannJoulesPerKelvin = 1.380649e-23;

    /// <summary>The standard noise temperature T0 = 290 K, the default for every method here.</summary>
    public const double StandardTemperatureKelvin = 290;

    /// <summary>The noise power density k·T in dBm per hertz.</summary>
    /// <param name="temperatureKelvin">The noise temperature in kelvin, above zero; 290 K by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">The temperature is not finite and positive.</exception>
    public static double DensityDbmPerHertz(double temperatureKelvin = StandardTemperatureKelvin) =>
        10 * Math.Log10(BoltzmannJoulesPerKelvin * Guard.Positive(temperatureKelvin, nameof(temperatureKelvin)) / 1e-3);

    /// <summary>The noise power k·T·B in a bandwidth, as a level in dBm.</summary>
    /// <param name="bandwidth">The noise bandwidth, above 0 Hz.</param>
    /// <param name="temperatureKelvin">The noise temperature in kelvin, above zero; 290 K by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">The bandwidth is zero, or the temperature is not finite and positive.</exception>
    public static Level NoisePower(Frequency bandwidth, double temperatureKelvin = StandardTemperatureKelvin)
    {
        var hertz = Guard.Positive(bandwidth.Hertz, nameof(bandwidth));
        return Level.FromDbm(DensityDbmPerHertz(temperatureKelvin) + 10 * Math.Log10(hertz));
    }

    /// <summary>The noise floor of a receiver: kTB + NF, as a level in dBm.</summary>
    /// <param name="bandwidth">The noise bandwidth, above 0 Hz.</param>
    /// <param name="noiseFigure">The receiver's noise figure, at least 0 dB.</param>
    /// <param name="temperatureKelvin">The noise temperature in kelvin, above zero; 290 K by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">The bandwidth is zero, the noise figure is negative, or the temperature is not finite and positive.</exception>
    public static Level NoiseFloor(Frequency bandwidth, Ratio noiseFigure, double temperatureKelvin = StandardTemperatureKelvin)
    {
        if (noiseFigure.Decibels < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(noiseFigure), noiseFigure.Decibels, "A noise figure must not be below 0 dB.");
        }

        return NoisePower(bandwidth, temperatureKelvin).Plus(noiseFigure);
    }
}
