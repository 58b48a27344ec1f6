using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.RfMath;

public class PhaseMathTests
{
    [Fact]
    public void UnwrapDegrees_CrossingMinus180_ContinuesSmoothly()
    {
        var unwrapped = PhaseMath.UnwrapDegrees([170, -170, -150, 170]);

        // Expected as an array: ImmutableArray's own Equals compares references, not elements.
        Assert.Equal(new double[] { 170, 190, 210, 170 }, unwrapped);
    }

    [Fact]
    public void UnwrapDegrees_FallingPhase_KeepsFalling()
    {
        var unwrapped = PhaseMath.UnwrapDegrees([-90, -170, 110, 30, -50]);

        Assert.Equal(new double[] { -90, -170, -250, -330, -410 }, unwrapped);
    }

    [Fact]
    public void UnwrapDegrees_AlreadyUnwrapped_IsUnchanged()
    {
        double[] phases = [10, -100, -250, -400, -579];

        Assert.Equal(phases, PhaseMath.UnwrapDegrees(phases));
    }

    [Fact]
    public void UnwrapDegrees_EmptyOrNotFinite()
    {
        Assert.Empty(PhaseMath.UnwrapDegrees([]));
        Assert.Throws<ArgumentException>(() => PhaseMath.UnwrapDegrees([0, double.NaN]));
    }

    [Fact]
    public void GroupDelaySeconds_Minus36DegreesOver100Megahertz_IsOneNanosecond()
    {
        // REFERENCES: group delay τ = −(1/360)·dφ°/df, −36° over 100 MHz → 1.0000 ns [book, calc].
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(100), Frequency.FromMegahertz(200), 11);
        var phases = axis.Select(f => -36 * (f.Megahertz - 100) / 100).ToArray();

        var delays = PhaseMath.GroupDelaySeconds(axis, phases);

        Assert.Equal(11, delays.Length);
        Assert.All(delays, tau => Assert.Equal(1.0000e-9, tau, 5e-14));
    }

    [Fact]
    public void GroupDelaySeconds_Minus10DegreesOver1Megahertz_Is27Nanoseconds()
    {
        // REFERENCES: group delay, −10° over 1 MHz → 27.778 ns [book, calc].
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 31);
        var phases = axis.Select(f => -10 * (f.Megahertz - 136)).ToArray();

        var delays = PhaseMath.GroupDelaySeconds(axis, phases);

        Assert.All(delays, tau => Assert.Equal(27.778e-9, tau, 5e-13));
    }

    [Fact]
    public void GroupDelaySeconds_WrappedLinearPhase_UnwrapsFirst()
    {
        // REFERENCES: group delay, −36° per 100 MHz → 1.0000 ns [book, calc]; over 0–2 GHz the
        // phase falls by 720°, given here wrapped into (−180°, 180°].
        var axis = FrequencyAxis.Linear(Frequency.Zero, Frequency.FromGigahertz(2), 201);
        var wrapped = axis.Select(f => Wrap(-36 * f.Megahertz / 100)).ToArray();

        var delays = PhaseMath.GroupDelaySeconds(axis, wrapped);

        Assert.All(delays, tau => Assert.Equal(1.0000e-9, tau, 5e-14));
    }

    [Fact]
    public void GroupDelaySeconds_SinglePoleLowPass_MatchesReferences()
    {
        // REFERENCES: single-pole low-pass fc = 1 MHz, φ = −atan(f/fc), τ = 1/(2π·fc·(1+(f/fc)²)):
        // τ(0) = 159.15 ns, τ(fc) = 79.577 ns [book, calc]. Fine grid: 1 kHz steps to 2 MHz.
        const double fc = 1e6;
        var axis = FrequencyAxis.Linear(Frequency.Zero, Frequency.FromMegahertz(2), 2001);
        var phases = axis.Select(f => -Math.Atan(f.Hertz / fc) * 180 / Math.PI).ToArray();

        var delays = PhaseMath.GroupDelaySeconds(axis, phases);

        Assert.Equal(159.15e-9, delays[0], 0.005e-9);
        Assert.Equal(79.577e-9, delays[1000], 0.0005e-9);
    }

    [Fact]
    public void GroupDelaySeconds_QuadraticPhase_CentralInsideOneSidedAtEnds()
    {
        // φ = −a·f² (f in MHz): central differences are exact for a quadratic, giving
        // τ = 2a·f/360 per MHz inside; the ends use one-sided differences, a·(f0 + f1)/360.
        const double a = 3.6;
        var axis = FrequencyAxis.FromList([Frequency.FromMegahertz(1), Frequency.FromMegahertz(2), Frequency.FromMegahertz(4), Frequency.FromMegahertz(5)]);
        var phases = axis.Select(f => -a * f.Megahertz * f.Megahertz).ToArray();

        var delays = PhaseMath.GroupDelaySeconds(axis, phases);

        // Inside, non-uniform steps: (φ(4) − φ(1))/(4 − 1) = −a·5 and (φ(5) − φ(2))/(5 − 2) = −a·7.
        Assert.Equal(a * (1 + 2) / 360 * 1e-6, delays[0], 1e-18);
        Assert.Equal(a * 5 / 360 * 1e-6, delays[1], 1e-18);
        Assert.Equal(a * 7 / 360 * 1e-6, delays[2], 1e-18);
        Assert.Equal(a * (4 + 5) / 360 * 1e-6, delays[3], 1e-18);
    }

    [Fact]
    public void GroupDelaySeconds_BadArguments_Throw()
    {
        var one = new[] { Frequency.FromMegahertz(137.5) };
        var falling = new[] { Frequency.FromMegahertz(138), Frequency.FromMegahertz(137) };
        var two = new[] { Frequency.FromMegahertz(137), Frequency.FromMegahertz(138) };

        Assert.Throws<ArgumentException>(() => PhaseMath.GroupDelaySeconds(one, [0.0]));
        Assert.Throws<ArgumentException>(() => PhaseMath.GroupDelaySeconds(falling, [0.0, 1.0]));
        Assert.Throws<ArgumentException>(() => PhaseMath.GroupDelaySeconds(two, [0.0]));
        Assert.Throws<ArgumentException>(() => PhaseMath.GroupDelaySeconds(two, [0.0, double.PositiveInfinity]));
    }

    private static double Wrap(double degrees) => degrees - 360 * Math.Ceiling((degrees - 180) / 360);
}
