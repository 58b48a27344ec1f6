namespace BenchRunner.Core.Statistics;

/// <summary>
/// Summary of a set of measurements: count, mean, sample standard deviation (n − 1 in the
/// denominator), minimum and maximum. Units are those of the samples.
/// </summary>
public readonly struct SampleStatistics
{
    private SampleStatistics(int count, double mean, double standardDeviation, double minimum, double maximum)
    {
        Count = count;
        Mean = mean;
        StandardDeviation = standardDeviation;
        Minimum = minimum;
        Maximum = maximum;
    }

    /// <summary>How many samples; at least 1 for a computed summary, 0 only for <c>default</c>.</summary>
    public int Count { get; }

    /// <summary>The arithmetic mean.</summary>
    public double Mean { get; }

    /// <summary>The sample standard deviation, with n − 1 in the denominator; 0 for a single sample.</summary>
    public double StandardDeviation { get; }

    /// <summary>The smallest sample.</summary>
    public double Minimum { get; }

    /// <summary>The largest sample.</summary>
    public double Maximum { get; }

    /// <summary>Summarises <paramref name="samples"/>.</summary>
    /// <exception cref="ArgumentException">No samples, or a sample that is NaN or infinite.</exception>
    public static SampleStatistics From(IEnumerable<double> samples)
    {
        ArgumentNullException.ThrowIfNull(samples);
        var values = samples.ToArray();
        if (values.Length == 0)
        {
            throw new ArgumentException("No samples: statistics need at least one value.", nameof(samples));
        }

        for (int i = 0; i < values.Length; i++)
        {
            if (!double.IsFinite(values[i]))
            {
                throw new ArgumentException($"Sample {i} is {values[i]}; every sample must be a finite number.", nameof(samples));
            }
        }

        double mean = values.Average();
        // Two passes: the sum of squared deviations from the mean avoids the cancellation of sum(x²) − n·mean².
        double squares = values.Sum(x => (x - mean) * (x - mean));
        double deviation = values.Length > 1 ? Math.Sqrt(squares / (values.Length - 1)) : 0;
        return new SampleStatistics(values.Length, mean, deviation, values.Min(), values.Max());
    }

    /// <inheritdoc />
    public override string ToString() =>
        FormattableString.Invariant($"n={Count} mean={Mean:G6} s={StandardDeviation:G6} min={Minimum:G6} max={Maximum:G6}");
}
