using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Validity;

/// <summary>
/// The attenuation-step test for distortion made inside a spectrum analyser: sweep the same span
/// twice, the second time with more input attenuation. The analyser corrects its display for the
/// attenuation, so a line at its input stays put, while a product its own mixer makes falls by the
/// step for second order and by twice the step for third order, since the mixer level fell by the
/// step ("Spectrum Analysis Basics", Application Note 150, ch. "Dynamic Range"; Witte, Spectrum and
/// Network Measurements; from memory). docs/measurement-validity.md gives the method and its limits.
/// </summary>
public static class OverloadCheck
{
    /// <summary>
    /// Compares <paramref name="lower"/> (taken at <paramref name="lowerAttenuation"/>) with
    /// <paramref name="higher"/> (at <paramref name="higherAttenuation"/>), both corrected for the
    /// attenuation as analysers display them. Every line of the lower sweep above the threshold is
    /// matched to the nearest line of the higher sweep within the frequency tolerance (found at any
    /// level, with the same least prominence) and classified by its change. A line that does not stand
    /// its least prominence plus the tolerance above the higher sweep's noise floor is
    /// <see cref="OverloadClass.HiddenByNoise"/> whether matched or not: the raised floor would hide
    /// it even if it were real, and its match may be noise.
    /// </summary>
    /// <returns>
    /// Unavailable when the step is not positive, the step is not more than twice the level
    /// tolerance (the classes would overlap), or the two sweeps have different points.
    /// </returns>
    public static FigureResult<OverloadVerdict> Compare(
        PowerTrace lower, Ratio lowerAttenuation, PowerTrace higher, Ratio higherAttenuation, OverloadCheckOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(lower);
        ArgumentNullException.ThrowIfNull(higher);
        options ??= new OverloadCheckOptions();
        double step = higherAttenuation.Decibels - lowerAttenuation.Decibels;
        double tolerance = options.LevelToleranceDb;
        if (!(step > 0))
        {
            return FigureResult<OverloadVerdict>.Unavailable(
                $"the second sweep's attenuation ({higherAttenuation}) must be above the first's ({lowerAttenuation})");
        }

        if (!double.IsFinite(tolerance) || tolerance < 0 || step <= 2 * tolerance)
        {
            return FigureResult<OverloadVerdict>.Unavailable(
                $"a {step} dB step cannot tell real lines from analyser-made ones with a ±{tolerance} dB tolerance; use a step above {2 * tolerance} dB");
        }

        if (!lower.Axis.SamePointsAs(higher.Axis))
        {
            return FigureResult<OverloadVerdict>.Unavailable("the two sweeps do not have the same frequency points");
        }

        var floor = PowerFigures.NoiseFloor(higher).Value;
        var lines = PowerFigures.Peaks(lower, options.Threshold, options.MinExcursionDb);
        var candidates = PowerFigures.Peaks(higher, Level.FromDbm(double.MinValue), options.MinExcursionDb);
        var judged = new List<OverloadPeak>(lines.Count);
        foreach (var line in lines)
        {
            PeakPoint? match = null;
            double nearest = double.PositiveInfinity;
            foreach (var candidate in candidates)
            {
                double distance = Math.Abs(candidate.Frequency.Hertz - line.Frequency.Hertz);
                if (distance <= options.FrequencyTolerance.Hertz && distance < nearest)
                {
                    match = candidate;
                    nearest = distance;
                }
            }

            // A real line keeps its level, so it would still stand its least prominence above the raised floor.
            bool wouldShow = line.LevelDb >= floor.Dbm + options.MinExcursionDb + tolerance;
            if (match is { } m)
            {
                // Below that, the match may be a ripple of the raised floor itself: a real line and noise cannot be told apart.
                double change = m.LevelDb - line.LevelDb;
                judged.Add(new OverloadPeak(line.Frequency, line.LevelDb, m.LevelDb, change,
                    wouldShow ? Classify(change, step, tolerance) : OverloadClass.HiddenByNoise));
            }
            else
            {
                judged.Add(new OverloadPeak(line.Frequency, line.LevelDb, null, null,
                    wouldShow ? OverloadClass.VanishedAnalyserMade : OverloadClass.HiddenByNoise));
            }
        }

        return FigureResult<OverloadVerdict>.Available(new OverloadVerdict(Ratio.FromDecibels(step), judged, floor));
    }

    /// <summary>The class of a corrected level change <paramref name="changeDb"/> for an attenuation step of <paramref name="stepDb"/>.</summary>
    public static OverloadClass Classify(double changeDb, double stepDb, double toleranceDb) =>
        Math.Abs(changeDb) <= toleranceDb ? OverloadClass.Real
        : Math.Abs(changeDb + stepDb) <= toleranceDb ? OverloadClass.AnalyserSecondOrder
        : Math.Abs(changeDb + 2 * stepDb) <= toleranceDb ? OverloadClass.AnalyserThirdOrder
        : OverloadClass.ChangedOtherwise;
}
