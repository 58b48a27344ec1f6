using System.Numerics;

namespace BenchRunner.Simulator.Tests.Support;

/// <summary>Assertions on complex numbers with a tolerance.</summary>
internal static class ComplexAssert
{
    /// <summary>Real and imaginary parts each within <paramref name="tolerance"/> of the expected ones.</summary>
    public static void Close(Complex expected, Complex actual, double tolerance)
    {
        if (Math.Abs(expected.Real - actual.Real) > tolerance || Math.Abs(expected.Imaginary - actual.Imaginary) > tolerance)
        {
            Assert.Fail($"Expected {expected} within {tolerance}, got {actual}.");
        }
    }

    /// <summary>|actual − expected| at most <paramref name="relative"/>·|expected|.</summary>
    public static void RelativelyClose(Complex expected, Complex actual, double relative)
    {
        var error = (actual - expected).Magnitude;
        if (error > relative * expected.Magnitude)
        {
            Assert.Fail($"Expected {expected:R} within {relative} relative, got {actual:R} (error {error:R}).");
        }
    }
}
