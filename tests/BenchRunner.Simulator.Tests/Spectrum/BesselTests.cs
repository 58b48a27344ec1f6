using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Tests.Spectrum;

public class BesselTests
{
    [Theory]
    // Abramowitz & Stegun, Handbook of Mathematical Functions, Table 9.1 (from memory).
    [InlineData(1.0, 0, 0.7651976866)]
    [InlineData(1.0, 1, 0.4400505857)]
    [InlineData(1.0, 2, 0.1149034849)]
    [InlineData(5.0, 0, -0.1775967713)]
    [InlineData(5.0, 1, -0.3275791376)]
    [InlineData(5.0, 2, 0.0465651163)]
    [InlineData(5.0, 3, 0.3648312306)]
    [InlineData(10.0, 0, -0.2459357645)]
    [InlineData(10.0, 1, 0.0434727462)]
    public void FirstKind_TabulatedArguments_MatchTable(double x, int order, double expected)
    {
        var j = Bessel.FirstKind(x, 5);

        Assert.Equal(expected, j[order], 9);
    }

    [Fact]
    public void FirstKind_FirstZeroOfJ0_IsZero()
    {
        // Abramowitz & Stegun, Table 9.5: first zero of J0 at 2.404825557695773 (from memory).
        var j = Bessel.FirstKind(2.404825557695773, 1);

        Assert.Equal(0, j[0], 12);
        Assert.Equal(0.5191474973, j[1], 9); // J1 there, A&S Table 9.5 (from memory)
    }

    [Theory]
    [InlineData(0.3)]
    [InlineData(3.0)]
    [InlineData(7.5)]
    public void FirstKind_ModerateArguments_AgreeWithPowerSeries(double x)
    {
        // J_n(x) = Σ_k (−1)^k (x/2)^(2k+n) / (k!(k+n)!): the defining series (A&S 9.1.10, from
        // memory), an independent algorithm, accurate in double precision for these small x.
        var j = Bessel.FirstKind(x, 12);

        for (int n = 0; n <= 12; n++)
        {
            Assert.Equal(Series(x, n), j[n], 10);
        }
    }

    [Fact]
    public void FirstKind_TinyArgument_UsesLeadingTerms()
    {
        var j = Bessel.FirstKind(1e-8, 2);

        Assert.Equal(1, j[0], 15);
        Assert.Equal(5e-9, j[1], 5e-9 * 1e-12);
        Assert.Equal(1.25e-17, j[2], 1.25e-17 * 1e-12);
    }

    [Fact]
    public void FirstKind_NegativeArgument_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Bessel.FirstKind(-1, 2));
    }

    private static double Series(double x, int n)
    {
        double sum = 0, term = Math.Pow(x / 2, n);
        for (int i = 1; i <= n; i++)
        {
            term /= i;
        }

        for (int k = 0; k < 60; k++)
        {
            sum += term;
            term *= -(x / 2) * (x / 2) / ((k + 1) * (k + 1 + n));
        }

        return sum;
    }
}
