using System.Collections.Immutable;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Masks;

/// <summary>
/// One side of a limit mask: corners joined by straight lines, in one or more sections.
/// Immutable.
/// </summary>
/// <remarks>
/// <para>Corners are in non-decreasing frequency. Two corners at one frequency make a vertical
/// step; at most two corners may share a frequency. Each section must cover a span of non-zero
/// width (so a lone corner is refused: it would limit only one exact frequency, which a sweep
/// seldom hits, and is almost always a mistake).</para>
/// <para>Between sections there is a gap, where this line sets no limit; outside the first
/// section's start and the last section's stop there is no limit either.</para>
/// </remarks>
public sealed class LimitLine
{
    private LimitLine(ImmutableArray<ImmutableArray<MaskCorner>> sections)
    {
        Sections = sections;
        Corners = sections.SelectMany(s => s).ToImmutableArray();
    }

    /// <summary>Creates a line of one section, with no gap.</summary>
    /// <param name="corners">At least two corners, in non-decreasing frequency.</param>
    /// <exception cref="ArgumentException">See <see cref="FromSections"/>.</exception>
    public LimitLine(IEnumerable<MaskCorner> corners)
        : this(Validate([(corners ?? throw new ArgumentNullException(nameof(corners))).ToImmutableArray()]))
    {
    }

    /// <summary>
    /// Creates a line of several sections with gaps between them.
    /// </summary>
    /// <param name="sections">One or more sections, each of at least two corners; frequencies
    /// never decrease, within a section or from one section to the next.</param>
    /// <exception cref="ArgumentException">No section; a section that does not span a non-zero
    /// frequency range; frequencies that decrease; three or more corners at one frequency.</exception>
    public static LimitLine FromSections(IEnumerable<IEnumerable<MaskCorner>> sections)
    {
        ArgumentNullException.ThrowIfNull(sections);
        return new LimitLine(Validate(sections.Select(s => s.ToImmutableArray()).ToImmutableArray()));
    }

    /// <summary>The sections in frequency order; each holds at least two corners.</summary>
    public ImmutableArray<ImmutableArray<MaskCorner>> Sections { get; }

    /// <summary>All corners of all sections, in order.</summary>
    public ImmutableArray<MaskCorner> Corners { get; }

    /// <summary>True when the line has more than one section.</summary>
    public bool HasGaps => Sections.Length > 1;

    /// <summary>The lowest frequency the line covers.</summary>
    public Frequency Start => Corners[0].Frequency;

    /// <summary>The highest frequency the line covers.</summary>
    public Frequency Stop => Corners[^1].Frequency;

    /// <summary>
    /// The limit at <paramref name="frequency"/>, or null where the line sets none (outside its
    /// sections or in a gap).
    /// </summary>
    /// <param name="frequency">Where to read the line.</param>
    /// <param name="interpolation">How the line runs between corners.</param>
    /// <param name="side">Which side the line is; where two values meet at one frequency (a
    /// step, or two sections touching) the stricter one counts: the lower for an upper limit,
    /// the higher for a lower limit.</param>
    /// <returns>The limit level in the mask's unit, before any peak offset.</returns>
    public double? LimitAt(Frequency frequency, MaskInterpolation interpolation, LimitSide side)
    {
        double f = frequency.Hertz;
        double? best = null;
        foreach (var section in Sections)
        {
            if (f < section[0].Frequency.Hertz || f > section[^1].Frequency.Hertz)
            {
                continue;
            }

            for (int i = 0; i + 1 < section.Length; i++)
            {
                var a = section[i];
                var b = section[i + 1];
                if (f < a.Frequency.Hertz || f > b.Frequency.Hertz)
                {
                    continue;
                }

                best = a.Frequency == b.Frequency
                    ? Stricter(Stricter(best, a.LevelDb, side), b.LevelDb, side)
                    : Stricter(best, Interpolate(a, b, f, interpolation), side);
            }
        }

        return best;
    }

    private static double Interpolate(MaskCorner a, MaskCorner b, double f, MaskInterpolation interpolation)
    {
        double fa = a.Frequency.Hertz, fb = b.Frequency.Hertz;

        // Exact corner values at the ends keep checks at a corner's frequency free of rounding.
        if (f == fa)
        {
            return a.LevelDb;
        }

        if (f == fb)
        {
            return b.LevelDb;
        }

        double t = interpolation == MaskInterpolation.Logarithmic
            ? Math.Log(f / fa) / Math.Log(fb / fa)
            : (f - fa) / (fb - fa);
        return a.LevelDb + (b.LevelDb - a.LevelDb) * t;
    }

    private static double Stricter(double? current, double candidate, LimitSide side) =>
        current is not { } c ? candidate
        : side == LimitSide.Upper ? Math.Min(c, candidate)
        : Math.Max(c, candidate);

    private static ImmutableArray<ImmutableArray<MaskCorner>> Validate(ImmutableArray<ImmutableArray<MaskCorner>> sections)
    {
        if (sections.Length == 0)
        {
            throw new ArgumentException("A limit line needs at least one section.", nameof(sections));
        }

        MaskCorner? previous = null;
        int sameFrequency = 0;
        for (int s = 0; s < sections.Length; s++)
        {
            var section = sections[s];
            if (section.Length < 2 || section[0].Frequency == section[^1].Frequency)
            {
                throw new ArgumentException(
                    $"Section {s} of the limit line must have corners at two or more frequencies to cover a span.", nameof(sections));
            }

            foreach (var corner in section)
            {
                if (previous is { } p)
                {
                    if (corner.Frequency < p.Frequency)
                    {
                        throw new ArgumentException(
                            $"Corner frequencies must not decrease: {corner.Frequency} after {p.Frequency}.", nameof(sections));
                    }

                    sameFrequency = corner.Frequency == p.Frequency ? sameFrequency + 1 : 1;
                    if (sameFrequency > 2)
                    {
                        throw new ArgumentException(
                            $"Three corners at {corner.Frequency}; a vertical step is exactly two corners at one frequency.", nameof(sections));
                    }
                }
                else
                {
                    sameFrequency = 1;
                }

                previous = corner;
            }
        }

        return sections;
    }
}
