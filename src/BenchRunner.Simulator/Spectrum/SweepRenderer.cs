using BenchRunner.Core.Traces;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// Turns spectral lines into the levels an analyser displays: each point is the sum of the lines'
/// powers weighted by the resolution filter centred on the point, plus a noise sample. Keeps its
/// line buffers between sweeps so a sweep allocates only its result.
/// </summary>
/// <remarks>
/// The filter is Gaussian in power, H(Δf) = 2^(−(2Δf/RBW)²), so it is 3.01 dB down at ±RBW/2 and
/// its shape in dB is a parabola. Lines farther than <see cref="ReachInRbw"/> RBWs from a point are
/// skipped: the filter is more than 300 dB down there. Noise: the envelope of Gaussian noise
/// is Rayleigh-distributed, so the power a sample detector sees is exponentially distributed about
/// its mean; each point draws X = −ln U (U uniform in (0, 1)) and adds X times the mean noise power.
/// </remarks>
internal sealed class SweepRenderer
{
    /// <summary>How many RBWs on each side of a point the filter is evaluated: 2^(−100) ≈ −301 dB at the edge.</summary>
    public const double ReachInRbw = 5;

    private double[] _hertz = new double[64];
    private double[] _milliwatts = new double[64];
    private int _count;
    private double _low;
    private double _high;

    /// <summary>Empties the line buffer and sets the band of interest: lines outside [low, high] Hz are dropped.</summary>
    public void Begin(double lowHz, double highHz)
    {
        _count = 0;
        _low = lowHz;
        _high = highHz;
    }

    /// <summary>Adds the lines of <paramref name="emission"/> at total power <paramref name="levelDbm"/>, those inside the band.</summary>
    public void Add(Emission emission, double levelDbm)
    {
        double centre = emission.Centre.Hertz;
        double reach = emission.ReachHz();
        if (centre + reach < _low || centre - reach > _high)
        {
            return;
        }

        var shape = emission.Shape;
        double milliwatts = Math.Pow(10, levelDbm / 10);
        for (int i = 0; i < shape.OffsetsHz.Length; i++)
        {
            double hertz = centre + shape.OffsetsHz[i];
            if (hertz > 0 && hertz >= _low && hertz <= _high)
            {
                Append(hertz, milliwatts * shape.Shares[i]);
            }
        }
    }

    /// <summary>The displayed level at each point of <paramref name="axis"/>, in dBm.</summary>
    public double[] Render(FrequencyAxis axis, double rbwHz, double noiseMilliwatts, Random random)
    {
        Array.Sort(_hertz, _milliwatts, 0, _count);
        var points = axis.Hertz.AsSpan();
        var levels = new double[points.Length];
        double reach = ReachInRbw * rbwHz;
        double exponent = -4 * Math.Log(2) / (rbwHz * rbwHz);
        int first = 0;
        for (int p = 0; p < points.Length; p++)
        {
            double f = points[p];
            while (first < _count && _hertz[first] < f - reach)
            {
                first++;
            }

            double signal = 0;
            for (int i = first; i < _count && _hertz[i] <= f + reach; i++)
            {
                double offset = _hertz[i] - f;
                signal += _milliwatts[i] * Math.Exp(exponent * offset * offset);
            }

            levels[p] = 10 * Math.Log10(signal + noiseMilliwatts * ExponentialSample(random));
        }

        return levels;
    }

    /// <summary>An exponentially distributed sample of mean 1, never 0 (so the level stays finite).</summary>
    private static double ExponentialSample(Random random)
    {
        double u;
        do
        {
            u = random.NextDouble();
        }
        while (u == 0);

        return -Math.Log(u);
    }

    private void Append(double hertz, double milliwatts)
    {
        if (_count == _hertz.Length)
        {
            Array.Resize(ref _hertz, _count * 2);
            Array.Resize(ref _milliwatts, _count * 2);
        }

        _hertz[_count] = hertz;
        _milliwatts[_count] = milliwatts;
        _count++;
    }
}
