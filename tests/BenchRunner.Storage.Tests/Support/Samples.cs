using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Tests.Support;

/// <summary>Runs and traces of the demo scenario: the 137 MHz preselector boards PSF-24-nnnn.</summary>
internal static class Samples
{
    public const string PlanText = """
        name: psf-137-passband
        sweep: S21 130 MHz to 145 MHz, 401 points
        mask: psf-137-passband.yaml
        """;

    public static RunRecord Run(string? serial = "PSF-24-0001", string? lot = "L24-03", RunMode mode = RunMode.Batch, bool retest = false) =>
        new(mode, "psf-137-passband", PlanText, "0.1.0", "bench-1")
        {
            Operator = "op-1",
            DutSerial = serial,
            Lot = lot,
            IsRetest = retest,
            BenchName = "workshop-bench",
            BenchText = "vna: simulated\n",
        };

    /// <summary>
    /// S21 of a single resonator centred on 137.5 MHz with a loaded Q of 137.5 / 3 (a 3 MHz -3 dB
    /// bandwidth): S21 = 1 / (1 + jQ(f/f0 - f0/f)).
    /// </summary>
    public static ComplexTrace PassbandS21(FrequencyAxis? axis = null)
    {
        axis ??= FrequencyAxis.Linear(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145), 401);
        const double f0 = 137.5e6, q = 137.5 / 3;
        return new ComplexTrace(axis, TraceQuantity.S21,
            axis.Hertz.Select(f => 1 / new Complex(1, q * (f / f0 - f0 / f))));
    }

    /// <summary>A spectrum: a -20 dBm line at 137.5 MHz over a -95 dBm floor with a little ripple.</summary>
    public static PowerTrace Spectrum(FrequencyAxis? axis = null)
    {
        axis ??= FrequencyAxis.Linear(Frequency.FromMegahertz(137), Frequency.FromMegahertz(138), 201);
        return new PowerTrace(axis, axis.Hertz.Select((f, i) =>
            Math.Abs(f - 137.5e6) < 1 ? -20.0 : -95 + 0.37 * Math.Sin(i * 1.7)));
    }

    /// <summary>Samples chosen to catch any lossy encoding: thirds, signed zeros, subnormals, extremes.</summary>
    public static ComplexTrace Awkward(FrequencyAxis axis)
    {
        var values = new[]
        {
            new Complex(1.0 / 3, -2.0 / 3),
            new Complex(-0.0, 0.0),
            new Complex(double.Epsilon, -double.Epsilon),
            new Complex(double.MaxValue, double.MinValue),
            new Complex(Math.PI, Math.E),
            new Complex(1e-300, 0.1),
        };
        return new ComplexTrace(axis, TraceQuantity.S11, Enumerable.Range(0, axis.Count).Select(i =>
        {
            var v = values[i % values.Length];
            return i < values.Length ? v : new Complex(v.Real / (i + 1), v.Imaginary / (i + 1));
        }));
    }

    public static string Sha256Of(string text) => PlanHash.Sha256Hex(text);
}
