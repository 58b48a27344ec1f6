using System.Collections.Immutable;
using System.Globalization;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Validity;

/// <summary>
/// A cable's loss (positive dB) at listed frequencies, interpolated linearly in dB against
/// frequency between them. Frequencies outside the table are refused, never extrapolated.
/// </summary>
public sealed class CableLossTable
{
    private readonly ImmutableArray<(double Hertz, double LossDb)> _points;

    private CableLossTable(ImmutableArray<(double Hertz, double LossDb)> points) => _points = points;

    /// <summary>The lowest frequency in the table.</summary>
    public Frequency Start => Frequency.FromHertz(_points[0].Hertz);

    /// <summary>The highest frequency in the table.</summary>
    public Frequency Stop => Frequency.FromHertz(_points[^1].Hertz);

    /// <summary>Builds a table from (frequency, loss) points in any order.</summary>
    /// <returns>Failed when there are fewer than two points, a frequency repeats, or a loss is not finite.</returns>
    public static ParseResult<CableLossTable> Create(IEnumerable<(Frequency Frequency, Ratio Loss)> points)
    {
        ArgumentNullException.ThrowIfNull(points);
        var sorted = points.Select(p => (p.Frequency.Hertz, p.Loss.Decibels)).OrderBy(p => p.Hertz).ToImmutableArray();
        if (sorted.Length < 2)
        {
            return ParseResult<CableLossTable>.Fail("a cable loss table needs at least two frequencies");
        }

        for (int i = 0; i < sorted.Length; i++)
        {
            if (!double.IsFinite(sorted[i].Decibels))
            {
                return ParseResult<CableLossTable>.Fail($"the loss at {Frequency.FromHertz(sorted[i].Hertz)} is not a finite number of dB");
            }

            if (i > 0 && sorted[i].Hertz == sorted[i - 1].Hertz)
            {
                return ParseResult<CableLossTable>.Fail($"{Frequency.FromHertz(sorted[i].Hertz)} is listed twice in the cable loss table");
            }
        }

        return ParseResult<CableLossTable>.Ok(new CableLossTable(sorted));
    }

    /// <summary>The loss at <paramref name="frequency"/>, linear in dB between the two neighbouring points.</summary>
    /// <returns>Unavailable outside <see cref="Start"/> to <see cref="Stop"/>.</returns>
    public FigureResult<Ratio> LossAt(Frequency frequency)
    {
        double f = frequency.Hertz;
        if (f < _points[0].Hertz || f > _points[^1].Hertz)
        {
            return FigureResult<Ratio>.Unavailable(
                $"{frequency} is outside the cable loss table ({Start} to {Stop}); the loss is not extrapolated");
        }

        int k = 1;
        while (k < _points.Length - 1 && _points[k].Hertz < f)
        {
            k++;
        }

        var (f0, l0) = _points[k - 1];
        var (f1, l1) = _points[k];
        return FigureResult<Ratio>.Available(Ratio.FromDecibels(l0 + (l1 - l0) * (f - f0) / (f1 - f0)));
    }

    /// <summary>"cable table 10 MHz to 1 GHz (4 points)".</summary>
    public override string ToString() =>
        string.Create(CultureInfo.InvariantCulture, $"cable table {Start} to {Stop} ({_points.Length} points)");
}
