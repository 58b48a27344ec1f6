namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// The simulator's pseudo-random source: SplitMix64 (Steele, Lea and Flood, "Fast splittable
/// pseudorandom number generators", 2014), with normal deviates by the Box–Muller transform.
/// Its own code rather than <see cref="Random"/>, so that a seed gives the same numbers on every
/// runtime version. Not thread-safe.
/// </summary>
internal sealed class SeededRandom
{
    private ulong _state;
    private double? _spareNormal;

    public SeededRandom(long seed) => _state = unchecked((ulong)seed);

    /// <summary>The next 64 random bits.</summary>
    public ulong NextBits()
    {
        unchecked
        {
            ulong z = _state += 0x9E3779B97F4A7C15UL;
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
            return z ^ (z >> 31);
        }
    }

    /// <summary>A uniform deviate in [0, 1), with 53 random bits.</summary>
    public double NextDouble() => (NextBits() >> 11) * (1.0 / (1UL << 53));

    /// <summary>A standard normal deviate (mean 0, standard deviation 1).</summary>
    public double NextNormal()
    {
        if (_spareNormal is { } spare)
        {
            _spareNormal = null;
            return spare;
        }

        double u1 = 1 - NextDouble();
        double u2 = NextDouble();
        double radius = Math.Sqrt(-2 * Math.Log(u1));
        _spareNormal = radius * Math.Sin(2 * Math.PI * u2);
        return radius * Math.Cos(2 * Math.PI * u2);
    }

    /// <summary>
    /// A normal deviate with the given mean and standard deviation, redrawn until it lies within
    /// <paramref name="limit"/> standard deviations of the mean.
    /// </summary>
    public double NextTruncatedNormal(double mean, double sigma, double limit = 3)
    {
        while (true)
        {
            double z = NextNormal();
            if (Math.Abs(z) <= limit)
            {
                return mean + sigma * z;
            }
        }
    }
}
