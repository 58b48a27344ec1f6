namespace BenchRunner.Simulator.Spectrum;

/// <summary>Bessel functions of the first kind of integer order, J_n(x), for the sidebands of angle modulation.</summary>
internal static class Bessel
{
    private const double Rescale = 1e100;
    private const double SmallArgument = 1e-6;

    /// <summary>
    /// J_0(x) … J_maxOrder(x), by the backward recurrence J_(k−1) = (2k/x)·J_k − J_(k+1) started
    /// far above both x and the highest order wanted, where the true values are negligible.
    /// Backward recurrence is stable where forward recurrence is not (for orders above x). The
    /// magnitudes are normalised with 1 = J_0² + 2·Σ J_k² (a sum of squares: no cancellation) and
    /// the sign with 1 = J_0 + 2·Σ J_2k.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">x negative or not finite, or a negative order.</exception>
    public static double[] FirstKind(double x, int maxOrder)
    {
        if (!double.IsFinite(x) || x < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(x), x, "The argument must be finite and not negative.");
        }

        ArgumentOutOfRangeException.ThrowIfNegative(maxOrder);
        var result = new double[maxOrder + 1];
        if (x < SmallArgument)
        {
            // Leading terms of the power series: J_n(x) ≈ (x/2)^n / n!, J_0(x) ≈ 1 − x²/4. The
            // recurrence below would overflow for tiny x, where 2k/x is huge.
            result[0] = 1 - x * x / 4;
            double term = 1;
            for (int n = 1; n <= maxOrder; n++)
            {
                term *= x / 2 / n;
                result[n] = term;
            }

            return result;
        }

        int start = (int)Math.Ceiling(Math.Max(maxOrder, x) + 10 * Math.Cbrt(x) + 20);
        start += start % 2;
        var j = new double[start + 2];
        j[start] = 1;
        for (int k = start; k > 0; k--)
        {
            j[k - 1] = 2 * k / x * j[k] - j[k + 1];
            if (Math.Abs(j[k - 1]) > Rescale)
            {
                for (int i = k - 1; i <= start; i++)
                {
                    j[i] /= Rescale;
                }
            }
        }

        double squares = j[0] * j[0], even = j[0];
        for (int k = 1; k <= start; k++)
        {
            squares += 2 * j[k] * j[k];
            if (k % 2 == 0)
            {
                even += 2 * j[k];
            }
        }

        double scale = Math.CopySign(1 / Math.Sqrt(squares), even);
        for (int k = 0; k <= maxOrder; k++)
        {
            result[k] = j[k] * scale;
        }

        return result;
    }

    /// <summary>The highest sideband order worth keeping for index β: J_n(β) falls off steeply once n exceeds β.</summary>
    public static int SidebandReach(double beta) => (int)Math.Ceiling(beta + 10 * Math.Cbrt(beta) + 10);
}
