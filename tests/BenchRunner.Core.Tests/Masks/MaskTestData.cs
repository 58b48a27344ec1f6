using System.Numerics;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.Masks;

/// <summary>Hand-built traces and limit lines for the mask tests.</summary>
internal static class MaskTestData
{
    /// <summary>An S-parameter trace with the given levels in dB (real, positive samples).</summary>
    public static ComplexTrace SParameter(double[] megahertz, double[] levelsDb, TraceQuantity quantity = TraceQuantity.S21) =>
        new(Axis(megahertz), quantity, levelsDb.Select(db => new Complex(Math.Pow(10, db / 20), 0)));

    /// <summary>A power trace with the given levels in dBm.</summary>
    public static PowerTrace Power(double[] megahertz, double[] levelsDbm) => new(Axis(megahertz), levelsDbm);

    /// <summary>A one-section line from (MHz, level) pairs.</summary>
    public static LimitLine Line(params (double Megahertz, double Level)[] corners) => new(Corners(corners));

    /// <summary>A line of several sections from (MHz, level) pairs.</summary>
    public static LimitLine Sections(params (double Megahertz, double Level)[][] sections) =>
        LimitLine.FromSections(sections.Select(Corners));

    public static FrequencyAxis Axis(double[] megahertz) => FrequencyAxis.FromList(megahertz.Select(Frequency.FromMegahertz));

    /// <summary>
    /// |S21| in dB of a lossless Butterworth (maximally flat) band-pass of order
    /// <paramref name="order"/>: |S21|² = 1 / (1 + x^(2N)) with the band-pass mapping
    /// x = (f/f0 − f0/f)·f0/BW, where BW is the −3.01 dB bandwidth.
    /// Pozar, Microwave Engineering, ch. 8 (maximally flat response and the low-pass to
    /// band-pass transformation); from memory.
    /// </summary>
    public static double ButterworthBandpassDb(double f, double f0, double bandwidth, int order)
    {
        double x = (f / f0 - f0 / f) * f0 / bandwidth;
        return -10 * Math.Log10(1 + Math.Pow(x, 2 * order));
    }

    private static IEnumerable<MaskCorner> Corners((double Megahertz, double Level)[] corners) =>
        corners.Select(c => new MaskCorner(Frequency.FromMegahertz(c.Megahertz), c.Level));
}
