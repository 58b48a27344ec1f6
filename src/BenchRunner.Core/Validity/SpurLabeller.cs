using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Validity;

/// <summary>
/// Names the lines of a spectrum from the carriers known to be in it: each carrier, the 2nd to
/// 5th harmonic of each carrier, and for each pair of carriers the two-tone products 2f1 − f2,
/// 2f2 − f1 (third order), f1 + f2 and f2 − f1 (second order). Carriers are numbered from 1 in
/// the order given; f1 is the lower-numbered carrier of a pair.
/// </summary>
public static class SpurLabeller
{
    /// <summary>The highest harmonic number looked for.</summary>
    public const int HighestHarmonic = 5;

    /// <summary>The smallest default tolerance: 1 kHz.</summary>
    public static Frequency MinimumTolerance { get; } = Frequency.FromKilohertz(1);

    /// <summary>
    /// The default frequency tolerance for a sweep made with <paramref name="resolutionBandwidth"/>:
    /// max(RBW, 1 kHz). A line can be no better placed than about one RBW, and harmonics of a carrier
    /// read one bin off land n times as far off.
    /// </summary>
    public static Frequency DefaultTolerance(Frequency resolutionBandwidth) =>
        resolutionBandwidth > MinimumTolerance ? resolutionBandwidth : MinimumTolerance;

    /// <summary>
    /// Labels every peak as the candidate frequency nearest to it within <paramref name="tolerance"/>;
    /// on a tie a carrier wins over a harmonic, a harmonic over a product, a lower order over a higher.
    /// Peaks near none stay <see cref="PeakOrigin.Unidentified"/>.
    /// </summary>
    /// <param name="carriers">The carriers present; none gives only unidentified peaks.</param>
    /// <param name="peaks">The lines, e.g. from <see cref="PowerFigures.Peaks"/>.</param>
    /// <param name="tolerance">How far a line may sit from a candidate frequency; see <see cref="DefaultTolerance"/>.</param>
    /// <returns>One label per peak, in the peaks' order.</returns>
    public static IReadOnlyList<LabelledPeak> Label(IReadOnlyList<CarrierSignal> carriers, IReadOnlyList<PeakPoint> peaks, Frequency tolerance)
    {
        ArgumentNullException.ThrowIfNull(carriers);
        ArgumentNullException.ThrowIfNull(peaks);
        var candidates = Candidates(carriers);
        var labelled = new List<LabelledPeak>(peaks.Count);
        foreach (var peak in peaks)
        {
            Candidate? best = null;
            double bestDistance = double.PositiveInfinity;
            foreach (var candidate in candidates)
            {
                double distance = Math.Abs(peak.Frequency.Hertz - candidate.Hertz);
                if (distance <= tolerance.Hertz && distance < bestDistance)
                {
                    best = candidate;
                    bestDistance = distance;
                }
            }

            labelled.Add(best is { } c
                ? new LabelledPeak(peak, c.Origin, c.Label, c.CarrierIndex, c.Order, peak.LevelDb - carriers[c.CarrierIndex].Level.Dbm)
                : new LabelledPeak(peak, PeakOrigin.Unidentified, "unidentified", null, null, null));
        }

        return labelled;
    }

    /// <summary>Every candidate, in order of precedence (earlier wins a tie).</summary>
    private static List<Candidate> Candidates(IReadOnlyList<CarrierSignal> carriers)
    {
        var list = new List<Candidate>();
        for (int i = 0; i < carriers.Count; i++)
        {
            list.Add(new Candidate(carriers[i].Frequency.Hertz, PeakOrigin.Carrier, $"carrier {i + 1}", i, 1));
        }

        for (int n = 2; n <= HighestHarmonic; n++)
        {
            for (int i = 0; i < carriers.Count; i++)
            {
                list.Add(new Candidate(n * carriers[i].Frequency.Hertz, PeakOrigin.Harmonic, $"H{n} of carrier {i + 1}", i, n));
            }
        }

        for (int order = 2; order <= 3; order++)
        {
            for (int i = 0; i < carriers.Count; i++)
            {
                for (int k = i + 1; k < carriers.Count; k++)
                {
                    double f1 = carriers[i].Frequency.Hertz, f2 = carriers[k].Frequency.Hertz;
                    int stronger = carriers[k].Level > carriers[i].Level ? k : i;
                    string a = $"f{i + 1}", b = $"f{k + 1}";
                    if (order == 2)
                    {
                        list.Add(new Candidate(f1 + f2, PeakOrigin.TwoToneProduct, $"{a}+{b}", stronger, 2));
                        list.Add(new Candidate(Math.Abs(f2 - f1), PeakOrigin.TwoToneProduct, f2 >= f1 ? $"{b}-{a}" : $"{a}-{b}", stronger, 2));
                    }
                    else
                    {
                        list.Add(new Candidate(Math.Abs(2 * f1 - f2), PeakOrigin.TwoToneProduct, $"2{a}-{b}", stronger, 3));
                        list.Add(new Candidate(Math.Abs(2 * f2 - f1), PeakOrigin.TwoToneProduct, $"2{b}-{a}", stronger, 3));
                    }
                }
            }
        }

        return list;
    }

    private readonly record struct Candidate(double Hertz, PeakOrigin Origin, string Label, int CarrierIndex, int Order);
}
