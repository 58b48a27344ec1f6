using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// The front-end properties of a simulated spectrum analyser. The defaults are invented but
/// typical of a low-cost analyser without preamplifier. Validated when the analyser is built,
/// every problem reported at once.
/// </summary>
public sealed class SpectrumAnalyserOptions
{
    /// <summary>The front end's noise figure at 0 dB input attenuation; default 24 dB (common practice, no source: typical of low-cost analysers without preamplifier). At least 0 dB.</summary>
    public Ratio NoiseFigure { get; init; } = Ratio.FromDecibels(24);

    /// <summary>The input noise temperature reference in kelvin; default 290 K (the standard T0).</summary>
    public double NoiseTemperatureKelvin { get; init; } = 290;

    /// <summary>The second-order intercept referred to the mixer input (IIP2); default +35 dBm (invented).</summary>
    public Level SecondOrderIntercept { get; init; } = Level.FromDbm(35);

    /// <summary>The third-order intercept referred to the mixer input (IIP3); default +10 dBm (invented).</summary>
    public Level ThirdOrderIntercept { get; init; } = Level.FromDbm(10);

    /// <summary>
    /// Gain compression of the mixer, driven by the total power at the mixer; default 1 dB at 0 dBm
    /// (invented, near IIP3 − 9.6 dB, where a pure cubic non-linearity compresses by 1 dB; from memory).
    /// <see cref="GainCompression.None"/> turns it off.
    /// </summary>
    public GainCompression MixerCompression { get; init; } = GainCompression.AtInputPoint(Level.FromDbm(0));

    /// <summary>The serial number reported in the identity; default <c>0001</c>.</summary>
    public string Serial { get; init; } = "0001";

    /// <summary>Throws when any option is out of range, naming all of them.</summary>
    /// <exception cref="ArgumentException">One or more options are invalid.</exception>
    internal void Validate()
    {
        var problems = new List<string>();
        if (NoiseFigure.Decibels < 0)
        {
            problems.Add($"the noise figure ({NoiseFigure}) must not be below 0 dB");
        }

        if (!double.IsFinite(NoiseTemperatureKelvin) || NoiseTemperatureKelvin <= 0)
        {
            problems.Add($"the noise temperature ({NoiseTemperatureKelvin} K) must be finite and above 0 K");
        }

        if (string.IsNullOrWhiteSpace(Serial) || Serial.Contains(','))
        {
            problems.Add("the serial number must be non-empty and hold no comma");
        }

        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid spectrum analyser options: " + string.Join("; ", problems) + ".");
        }
    }
}
