using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Tests.Support;

/// <summary>Reads levels off simulated traces the way a test engineer would: with the Core figures, never from the model's internals.</summary>
internal static class SpectrumReadings
{
    /// <summary>
    /// The spectral line nearest <paramref name="expected"/> found by <see cref="PowerFigures.Peaks"/>
    /// (at least 20 dB prominence, above <paramref name="threshold"/>); fails when there is none within <paramref name="within"/>.
    /// </summary>
    public static PeakPoint LineNear(PowerTrace trace, Frequency expected, Level threshold, Frequency within)
    {
        var lines = PowerFigures.Peaks(trace, threshold, minExcursionDb: 20);
        Assert.NotEmpty(lines);
        var nearest = lines.MinBy(l => Math.Abs(l.Frequency.Hertz - expected.Hertz));
        Assert.True(
            Math.Abs(nearest.Frequency.Hertz - expected.Hertz) <= within.Hertz,
            $"no line within {within} of {expected}; nearest at {nearest.Frequency} ({nearest.LevelDb:0.00} dBm)");
        return nearest;
    }

    /// <summary>Sweeps <paramref name="analyser"/> over <paramref name="centre"/> ± <paramref name="span"/>/2 and reads the line at the centre.</summary>
    public static double LevelAt(SimulatedSpectrumAnalyser analyser, Frequency centre, Frequency span, Level threshold)
    {
        analyser.SetCentreSpan(centre, span);
        var trace = analyser.Sweep();
        return LineNear(trace, centre, threshold, Frequency.FromHertz(span.Hertz / 10)).LevelDb;
    }

    /// <summary>The mean of the points' linear powers, in dBm.</summary>
    public static double MeanPowerDbm(PowerTrace trace) =>
        10 * Math.Log10(trace.LevelsDb.Average(l => Math.Pow(10, l / 10)));
}
