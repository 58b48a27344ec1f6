using System.Collections.Immutable;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// A signal as power at frequencies: a carrier of total power <see cref="Level"/> at
/// <see cref="Centre"/>, unmodulated (a CW line) or angle-modulated by one or more tones, whose
/// power then spreads over Bessel-function sidebands (see <see cref="Lines"/>). Immutable.
/// </summary>
/// <remarks>
/// An angle-modulated carrier has a constant envelope, so its power does not depend on the
/// modulation, and a memoryless non-linearity turns it into harmonics and mixing products that
/// are themselves angle-modulated (the k-th harmonic carries k times the index). That is why the
/// analyser's front end can treat an FM signal like a CW carrier of the same power for levels.
/// </remarks>
public sealed class Emission
{
    private LineShape? _shape;

    private Emission(Frequency centre, Level level, ImmutableArray<ModulationTone> modulation, LineShape? shape)
    {
        Centre = centre;
        Level = level;
        Modulation = modulation;
        _shape = shape;
    }

    /// <summary>The carrier frequency, above 0 Hz.</summary>
    public Frequency Centre { get; }

    /// <summary>The total power of the emission, all sidebands included.</summary>
    public Level Level { get; }

    /// <summary>The modulating tones; empty for an unmodulated carrier.</summary>
    public ImmutableArray<ModulationTone> Modulation { get; }

    /// <summary>True for a CW carrier (no modulation, or only tones of index 0).</summary>
    public bool IsUnmodulated => Modulation.All(t => t.Index == 0);

    internal LineShape Shape => _shape ??= LineShape.Of(Modulation);

    /// <summary>An unmodulated (CW) carrier.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is 0 Hz.</exception>
    public static Emission Cw(Frequency frequency, Level level) =>
        new(CheckCentre(frequency), level, [], LineShape.Unmodulated);

    /// <summary>
    /// A carrier frequency-modulated by one tone: peak deviation Δf, modulating frequency fm,
    /// index β = Δf / fm. By Carson's rule its power lies (about 98 %) within 2(Δf + fm).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The carrier or the modulating frequency is 0 Hz.</exception>
    public static Emission Fm(Frequency carrier, Level level, Frequency peakDeviation, Frequency modulatingFrequency) =>
        new(CheckCentre(carrier), level, [ModulationTone.FromDeviation(peakDeviation, modulatingFrequency)], null);

    /// <summary>A carrier angle-modulated by several independent tones at once.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The carrier frequency is 0 Hz.</exception>
    public static Emission AngleModulated(Frequency carrier, Level level, IEnumerable<ModulationTone> tones)
    {
        ArgumentNullException.ThrowIfNull(tones);
        return new(CheckCentre(carrier), level, [.. tones], null);
    }

    /// <summary>The same signal at another total power (the sideband shares are kept).</summary>
    public Emission WithLevel(Level level) => new(Centre, level, Modulation, _shape);

    /// <summary>
    /// The spectral lines, sorted by frequency, with levels summing (in milliwatts) to
    /// <see cref="Level"/>: one line for a CW carrier; for a tone of index β at rate fm, lines at
    /// centre + n·fm holding J_n(β)² of the power. Lines below −150 dBc are left out, as are lines
    /// that would fall at or below 0 Hz.
    /// </summary>
    public IReadOnlyList<SpectralLine> Lines()
    {
        var shape = Shape;
        var lines = new List<SpectralLine>(shape.OffsetsHz.Length);
        for (int i = 0; i < shape.OffsetsHz.Length; i++)
        {
            double hertz = Centre.Hertz + shape.OffsetsHz[i];
            if (hertz > 0)
            {
                lines.Add(new SpectralLine(Frequency.FromHertz(hertz), Level.FromDbm(Level.Dbm + 10 * Math.Log10(shape.Shares[i]))));
            }
        }

        lines.Sort((a, b) => a.Frequency.CompareTo(b.Frequency));
        return lines;
    }

    /// <summary>Formats as e.g. <c>137.5 MHz at -70 dBm, β 6.083 at 2.4 kHz</c>.</summary>
    public override string ToString() =>
        IsUnmodulated ? $"{Centre} at {Level}, CW" : $"{Centre} at {Level}, {string.Join(", ", Modulation)}";

    /// <summary>
    /// The mixing product at |<paramref name="orderA"/>·fa + <paramref name="orderB"/>·fb| with the
    /// given level, carrying the modulation of both parents scaled by their orders; null when it
    /// falls below 1 Hz. With <paramref name="b"/> null it is the |orderA|-th harmonic of <paramref name="a"/>.
    /// </summary>
    internal static Emission? Product(Emission a, int orderA, Emission? b, int orderB, double levelDbm)
    {
        double hertz = Math.Abs(orderA * a.Centre.Hertz + (b is null ? 0 : orderB * b.Centre.Hertz));
        if (hertz < 1)
        {
            return null;
        }

        var tones = a.Modulation.Select(t => t.Scaled(orderA));
        if (b is not null)
        {
            tones = tones.Concat(b.Modulation.Select(t => t.Scaled(orderB)));
        }

        var modulation = tones.Where(t => t.Index > 0).ToImmutableArray();
        return new Emission(Frequency.FromHertz(hertz), Level.FromDbm(levelDbm), modulation, modulation.IsEmpty ? LineShape.Unmodulated : null);
    }

    /// <summary>
    /// How far from the centre this emission's lines can reach, without working them out: the
    /// sideband reach of each tone times its rate, summed.
    /// </summary>
    internal double ReachHz() =>
        _shape?.ReachHz ?? Modulation.Sum(t => t.Index == 0 ? 0 : Bessel.SidebandReach(t.Index) * t.Rate.Hertz);

    private static Frequency CheckCentre(Frequency centre) =>
        centre.Hertz > 0 ? centre : throw new ArgumentOutOfRangeException(nameof(centre), centre.Hertz, "A carrier frequency must be above 0 Hz.");
}
