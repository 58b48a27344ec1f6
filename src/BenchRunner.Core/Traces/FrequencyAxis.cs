using System.Collections;
using System.Collections.Immutable;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Traces;

/// <summary>
/// The immutable, strictly increasing list of frequencies at which a trace was measured.
/// </summary>
public sealed class FrequencyAxis : IReadOnlyList<Frequency>
{
    private readonly ImmutableArray<double> _hertz;

    private FrequencyAxis(ImmutableArray<double> hertz, FrequencyAxisKind kind)
    {
        _hertz = hertz;
        Kind = kind;
    }

    /// <summary>How the points were laid out.</summary>
    public FrequencyAxisKind Kind { get; }

    /// <summary>The number of points (at least one).</summary>
    public int Count => _hertz.Length;

    /// <summary>The frequencies in hertz, strictly increasing.</summary>
    public ImmutableArray<double> Hertz => _hertz;

    /// <summary>The first (lowest) frequency.</summary>
    public Frequency Start => Frequency.FromHertz(_hertz[0]);

    /// <summary>The last (highest) frequency.</summary>
    public Frequency Stop => Frequency.FromHertz(_hertz[^1]);

    /// <summary>The frequency of point <paramref name="index"/>.</summary>
    public Frequency this[int index] => Frequency.FromHertz(_hertz[index]);

    /// <summary>
    /// <paramref name="points"/> frequencies equally spaced from <paramref name="start"/> to
    /// <paramref name="stop"/>, both included. One point requires start = stop.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than one point, or stop not above start.</exception>
    public static FrequencyAxis Linear(Frequency start, Frequency stop, int points)
    {
        ValidateSweep(start, stop, points);
        var builder = ImmutableArray.CreateBuilder<double>(points);
        double step = points == 1 ? 0 : (stop.Hertz - start.Hertz) / (points - 1);
        for (int i = 0; i < points; i++)
        {
            builder.Add(i == points - 1 ? stop.Hertz : start.Hertz + step * i);
        }

        return new FrequencyAxis(builder.MoveToImmutable(), FrequencyAxisKind.Linear);
    }

    /// <summary>
    /// <paramref name="points"/> frequencies equally spaced in log(frequency) from
    /// <paramref name="start"/> to <paramref name="stop"/>, both included.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Start is zero, fewer than one point, or stop not above start.</exception>
    public static FrequencyAxis Logarithmic(Frequency start, Frequency stop, int points)
    {
        ValidateSweep(start, stop, points);
        if (start.Hertz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(start), "A logarithmic sweep must start above 0 Hz.");
        }

        var builder = ImmutableArray.CreateBuilder<double>(points);
        double logStart = Math.Log(start.Hertz), logStop = Math.Log(stop.Hertz);
        double step = points == 1 ? 0 : (logStop - logStart) / (points - 1);
        for (int i = 0; i < points; i++)
        {
            builder.Add(i == 0 ? start.Hertz : i == points - 1 ? stop.Hertz : Math.Exp(logStart + step * i));
        }

        return new FrequencyAxis(builder.MoveToImmutable(), FrequencyAxisKind.Logarithmic);
    }

    /// <summary>An axis from an explicit list of frequencies in hertz.</summary>
    /// <exception cref="ArgumentException">Empty, not finite, negative, or not strictly increasing.</exception>
    public static FrequencyAxis FromHertz(IEnumerable<double> hertz)
    {
        ArgumentNullException.ThrowIfNull(hertz);
        var values = hertz.ToImmutableArray();
        if (values.Length == 0)
        {
            throw new ArgumentException("A frequency axis needs at least one point.", nameof(hertz));
        }

        for (int i = 0; i < values.Length; i++)
        {
            if (!double.IsFinite(values[i]) || values[i] < 0)
            {
                throw new ArgumentException($"Point {i} ({values[i]} Hz) is not a finite, non-negative frequency.", nameof(hertz));
            }

            if (i > 0 && values[i] <= values[i - 1])
            {
                throw new ArgumentException($"Frequencies must be strictly increasing: point {i} ({values[i]} Hz) follows {values[i - 1]} Hz.", nameof(hertz));
            }
        }

        return new FrequencyAxis(values, FrequencyAxisKind.List);
    }

    /// <summary>An axis from an explicit list of frequencies.</summary>
    public static FrequencyAxis FromList(IEnumerable<Frequency> frequencies) =>
        FromHertz(frequencies.Select(f => f.Hertz));

    /// <summary>True when <paramref name="other"/> has exactly the same points.</summary>
    public bool SamePointsAs(FrequencyAxis other) => ReferenceEquals(this, other) || _hertz.AsSpan().SequenceEqual(other._hertz.AsSpan());

    /// <inheritdoc/>
    public IEnumerator<Frequency> GetEnumerator()
    {
        foreach (var hz in _hertz)
        {
            yield return Frequency.FromHertz(hz);
        }
    }

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    /// <summary>Describes the axis, e.g. <c>401 points, 130 MHz to 145 MHz (linear)</c>.</summary>
    public override string ToString() =>
        $"{Count} point{(Count == 1 ? "" : "s")}, {Start} to {Stop} ({Kind.ToString().ToLowerInvariant()})";

    private static void ValidateSweep(Frequency start, Frequency stop, int points)
    {
        if (points < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(points), points, "A sweep needs at least one point.");
        }

        if (points == 1 ? stop != start : stop <= start)
        {
            throw new ArgumentOutOfRangeException(nameof(stop), stop.Hertz,
                points == 1 ? "A one-point sweep needs stop equal to start." : "Stop must be above start.");
        }
    }
}
