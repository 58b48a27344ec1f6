using System.Numerics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Devices;

/// <summary>
/// A small-signal and large-signal description of an amplifier, for the network analyser (S21)
/// and the spectrum side (noise figure, compression, intercept). The gain follows a first-order
/// high-pass at <see cref="LowCorner"/> (coupling capacitors) and a first-order low-pass at
/// <see cref="HighCorner"/> (the transistor's roll-off), scaled so that it is exactly
/// <see cref="GainAtCentre"/> at <see cref="Centre"/>, with a pure delay on top:
/// S21(f) = K·(jf/fL)/(1 + jf/fL)·1/(1 + jf/fH)·e^(−j2πfτ).
/// </summary>
public sealed record AmplifierModel
{
    /// <summary>The gain at <see cref="Centre"/>.</summary>
    public required Ratio GainAtCentre { get; init; }

    /// <summary>The frequency at which the gain is <see cref="GainAtCentre"/>.</summary>
    public required Frequency Centre { get; init; }

    /// <summary>The −3 dB corner of the low-frequency roll-off (first order).</summary>
    public required Frequency LowCorner { get; init; }

    /// <summary>The −3 dB corner of the high-frequency roll-off (first order).</summary>
    public required Frequency HighCorner { get; init; }

    /// <summary>The signal delay through the amplifier beyond that of the corners, in seconds (τ).</summary>
    public required double DelaySeconds { get; init; }

    /// <summary>The noise figure (taken as flat across the band).</summary>
    public required Ratio NoiseFigure { get; init; }

    /// <summary>The output level at which the gain has dropped by 1 dB (output P1dB).</summary>
    public required Level OutputP1dB { get; init; }

    /// <summary>The output third-order intercept point (OIP3).</summary>
    public required Level OutputIp3 { get; init; }

    /// <summary>
    /// The workshop's 137 MHz LNA: 20 dB at 137.5 MHz falling gently (about 0.2 dB from 130 to
    /// 145 MHz), corners at 10 MHz and 250 MHz, 0.5 ns delay, NF 1 dB, output P1dB +10 dBm and
    /// OIP3 +20 dBm (OIP3 ≈ P1dB + 10 dB: common practice, no source).
    /// </summary>
    public static AmplifierModel Lna137 { get; } = new()
    {
        GainAtCentre = Ratio.FromDecibels(20),
        Centre = Frequency.FromMegahertz(137.5),
        LowCorner = Frequency.FromMegahertz(10),
        HighCorner = Frequency.FromMegahertz(250),
        DelaySeconds = 0.5e-9,
        NoiseFigure = Ratio.FromDecibels(1),
        OutputP1dB = Level.FromDbm(10),
        OutputIp3 = Level.FromDbm(20),
    };

    /// <summary>The input level at which the output reaches <see cref="OutputP1dB"/> at <see cref="Centre"/>: P1dB − (gain − 1 dB).</summary>
    public Level InputP1dB => Level.FromDbm(OutputP1dB.Dbm - GainAtCentre.Decibels + 1);

    /// <summary>The complex forward transmission S21 at <paramref name="hertz"/> (above zero).</summary>
    public Complex TransmissionAt(double hertz) =>
        Shape(hertz) * (GainAtCentre.VoltageRatio / Shape(Centre.Hertz).Magnitude);

    /// <summary>The gain |S21|² at <paramref name="frequency"/>, in dB.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A frequency of 0 Hz.</exception>
    public Ratio GainAt(Frequency frequency)
    {
        if (frequency.Hertz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(frequency), frequency.Hertz, "The gain is defined above 0 Hz.");
        }

        return Ratio.FromDecibels(20 * Math.Log10(TransmissionAt(frequency.Hertz).Magnitude));
    }

    private Complex Shape(double hertz)
    {
        var highPass = new Complex(0, hertz / LowCorner.Hertz) / new Complex(1, hertz / LowCorner.Hertz);
        var lowPass = 1 / new Complex(1, hertz / HighCorner.Hertz);
        return highPass * lowPass * Complex.FromPolarCoordinates(1, -2 * Math.PI * hertz * DelaySeconds);
    }
}
