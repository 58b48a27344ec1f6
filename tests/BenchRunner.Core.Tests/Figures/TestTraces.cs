using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.Figures;

/// <summary>Builds traces for the figure tests.</summary>
internal static class TestTraces
{
    public const double SeriesR = 5, SeriesL = 100e-6, SeriesC = 2.5330e-12, Z0 = 50;

    /// <summary>An S-parameter trace with the given levels in dB (phase zero).</summary>
    public static ComplexTrace FromDb(TraceQuantity quantity, double[] hertz, double[] levelsDb) =>
        new(FrequencyAxis.FromHertz(hertz), quantity, levelsDb.Select(db => new Complex(Math.Pow(10, db / 20), 0)));

    /// <summary>An S21 trace with frequencies in megahertz and levels in dB.</summary>
    public static ComplexTrace S21Mhz(double[] megahertz, double[] levelsDb) =>
        FromDb(TraceQuantity.S21, megahertz.Select(f => f * 1e6).ToArray(), levelsDb);

    /// <summary>
    /// S21 of a series R-L-C between two 50 Ω ports, S21 = 2Z0/(2Z0 + Z) (Pozar, Microwave
    /// Engineering, Table 4.2), with the values of the REFERENCES exact case.
    /// </summary>
    public static ComplexTrace SeriesResonator(double startHz, double stopHz, int points)
    {
        var axis = FrequencyAxis.Linear(Frequency.FromHertz(startHz), Frequency.FromHertz(stopHz), points);
        return new ComplexTrace(axis, TraceQuantity.S21, axis.Hertz.Select(SeriesS21));
    }

    public static Complex SeriesS21(double hz)
    {
        double w = 2 * Math.PI * hz;
        var z = new Complex(SeriesR, w * SeriesL - 1 / (w * SeriesC));
        return 2 * Z0 / (2 * Z0 + z);
    }

    /// <summary>The exact resonance 1/(2π√(LC)) of the series circuit.</summary>
    public static double SeriesF0 => 1 / (2 * Math.PI * Math.Sqrt(SeriesL * SeriesC));

    /// <summary>
    /// The frequency above (sign +1) or below (sign −1) resonance where the series reactance is
    /// ±x ohms: ωL − 1/(ωC) = x solved for ω.
    /// </summary>
    public static double SeriesReactanceHz(double x) =>
        (x + Math.Sqrt(x * x + 4 * SeriesL / SeriesC)) / (2 * SeriesL) / (2 * Math.PI);

    public static PowerTrace Power(double[] hertz, double[] levelsDbm) =>
        new(FrequencyAxis.FromHertz(hertz), levelsDbm);

    public static double[] LinearHz(double startHz, double stepHz, int points) =>
        Enumerable.Range(0, points).Select(i => startHz + i * stepHz).ToArray();
}
