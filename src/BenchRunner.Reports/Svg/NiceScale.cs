namespace BenchRunner.Reports.Svg;

/// <summary>
/// Round axis ends and tick steps: the step is 1, 2 or 5 times a power of ten, and the ends are
/// whole steps that enclose the data (the usual way of labelling graph axes; common practice, no source).
/// </summary>
/// <param name="Minimum">The axis's lower end, a whole number of steps.</param>
/// <param name="Maximum">The axis's upper end, a whole number of steps, above <paramref name="Minimum"/>.</param>
/// <param name="Step">The distance between ticks.</param>
public sealed record NiceScale(double Minimum, double Maximum, double Step)
{
    /// <summary>A scale enclosing <paramref name="low"/> to <paramref name="high"/> with at most about <paramref name="ticks"/> ticks.</summary>
    /// <exception cref="ArgumentException">A value that is not finite, or fewer than 2 ticks.</exception>
    public static NiceScale Enclosing(double low, double high, int ticks = 6)
    {
        if (!double.IsFinite(low) || !double.IsFinite(high))
        {
            throw new ArgumentException($"An axis needs finite ends, not {low} and {high}.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(ticks, 2);
        if (low > high)
        {
            (low, high) = (high, low);
        }

        if (high - low < 1e-12 * Math.Max(1, Math.Abs(high)))
        {
            // One value only: give it a little room either side.
            var room = Math.Abs(low) > 0 ? Math.Abs(low) * 0.01 : 1;
            low -= room;
            high += room;
        }

        var step = Round((high - low) / (ticks - 1));
        var minimum = Math.Floor(low / step) * step;
        var maximum = Math.Ceiling(high / step) * step;
        return new NiceScale(minimum, maximum == minimum ? minimum + step : maximum, step);
    }

    /// <summary>
    /// A scale that runs exactly from <paramref name="low"/> to <paramref name="high"/> (a swept
    /// frequency range, say), with round ticks inside it.
    /// </summary>
    /// <exception cref="ArgumentException">A value that is not finite, equal ends, or fewer than 2 ticks.</exception>
    public static NiceScale Exact(double low, double high, int ticks = 6)
    {
        var round = Enclosing(low, high, ticks);
        if (!(high > low))
        {
            throw new ArgumentException($"An exact axis needs a lower end below its upper end, not {low} and {high}.");
        }

        return new NiceScale(low, high, round.Step);
    }

    /// <summary>The tick values: every whole multiple of <see cref="Step"/> from <see cref="Minimum"/> to <see cref="Maximum"/>.</summary>
    public IReadOnlyList<double> Ticks()
    {
        var first = (long)Math.Ceiling(Minimum / Step - 1e-9);
        var last = (long)Math.Floor(Maximum / Step + 1e-9);
        var ticks = new List<double>();
        for (long i = first; i <= last; i++)
        {
            ticks.Add(i * Step);
        }

        return ticks;
    }

    private static double Round(double raw)
    {
        var power = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        var fraction = raw / power;
        var nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
        return nice * power;
    }
}
