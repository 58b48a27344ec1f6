using System.Text.Json.Nodes;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Validity;
using BenchRunner.Execution.Plans;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Running;

/// <summary>The <c>check-overload</c> step: the attenuation-step test on a spectrum analyser (docs/measurement-validity.md).</summary>
public sealed partial class PlanRunner
{
    /// <summary>The suffix of the trace name under which the raised-attenuation sweep is stored.</summary>
    public const string RaisedTraceSuffix = "-raised";

    /// <summary>The most undecided lines named in a check's one-line detail; all are in its lines.</summary>
    private const int ListedAtMost = 4;

    private async Task CheckOverloadAsync(OverloadCheckStep step, string name, RunState state, CancellationToken cancellationToken)
    {
        var analyser = Capability<ISpectrumAnalyser>(state, step.Role);
        if (!state.SpectrumSettings.TryGetValue(step.Role, out var settings))
        {
            throw new NotSupportedException($"{step.Location}: \"{step.Word}\" needs an earlier set-spectrum-analyser step for \"{step.Role}\".");
        }

        var raised = settings with { InputAttenuation = settings.InputAttenuation + step.RaiseBy };
        var lowerRaw = await analyser.AcquireAsync(cancellationToken).ConfigureAwait(false);
        await analyser.ConfigureAsync(raised, cancellationToken).ConfigureAwait(false);
        var higherRaw = await analyser.AcquireAsync(cancellationToken).ConfigureAwait(false);
        await analyser.ConfigureAsync(settings, cancellationToken).ConfigureAwait(false);

        var (lower, compensation, lowerFlags) = await CompensateAsync(step.Role, lowerRaw, state).ConfigureAwait(false);
        var (higher, _, higherFlags) = await CompensateAsync(step.Role, higherRaw, state).ConfigureAwait(false);
        var options = new OverloadCheckOptions
        {
            Threshold = step.Threshold,
            FrequencyTolerance = FrequencyTolerance(settings, lower),
            LevelToleranceDb = step.ToleranceDb,
        };
        var verdict = OverloadCheck.Compare(lower, settings.InputAttenuation, higher, raised.InputAttenuation, options);
        var lines = verdict.IsAvailable ? Judge(step, lower, verdict.Value, options) : [];
        bool overloaded = lines.Any(l => l.IsAnalyserMade || l.Class == OverloadClass.ChangedOtherwise);

        var traceName = step.Trace.Name;
        await KeepAsync(step.Role, traceName, lower, FigureSummary.ForSpectrum(lower), name, state, lowerFlags | OverloadFlag(overloaded), compensation).ConfigureAwait(false);
        await KeepAsync(step.Role, traceName + RaisedTraceSuffix, higher, FigureSummary.ForSpectrum(higher), name, state, higherFlags, compensation).ConfigureAwait(false);
        if (overloaded)
        {
            state.OverloadedTraces.Add(traceName);
        }

        var what = $"overload check of {traceName} ({settings.InputAttenuation} then {raised.InputAttenuation} input attenuation)";
        var result = verdict.IsAvailable
            ? new CheckResult(name, what, !lines.Any(l => l.Relied && l.IsAnalyserMade), Describe(step, lines, MissingLines(step, lines, options)), null, null) { Lines = lines }
            : new CheckResult(name, what, false, $"could not be judged: {verdict.Reason}", null, null);
        await state.RecordAsync(result with { Kind = CheckKind.Overload, Trace = traceName, DetailJson = DetailJson(step, raised, lines, compensation) }).ConfigureAwait(false);
    }

    private static SweepFlags OverloadFlag(bool overloaded) => overloaded ? SweepFlags.Overloaded : SweepFlags.None;

    /// <summary>
    /// Lines are matched by frequency within max(RBW, 1 kHz) (<see cref="SpurLabeller.DefaultTolerance"/>),
    /// and never closer than one trace point apart, since a line is found at the nearest point.
    /// </summary>
    private static Frequency FrequencyTolerance(SpectrumSettings settings, PowerTrace trace)
    {
        var byRbw = SpurLabeller.DefaultTolerance(settings.ResolutionBandwidth);
        double pointSpacing = trace.Count > 1 ? (trace.Axis.Stop.Hertz - trace.Axis.Start.Hertz) / (trace.Count - 1) : 0;
        return pointSpacing > byRbw.Hertz ? Frequency.FromHertz(pointSpacing) : byRbw;
    }

    private static List<JudgedLine> Judge(OverloadCheckStep step, PowerTrace lower, OverloadVerdict verdict, OverloadCheckOptions options)
    {
        // The same call as the comparison's own, so the peaks line up one to one with the verdict's.
        var peaks = PowerFigures.Peaks(lower, options.Threshold, options.MinExcursionDb);
        var carriers = step.Carriers.Select(f => new CarrierSignal(f, Level.FromDbm(LevelNear(lower, peaks, f, options.FrequencyTolerance)))).ToList();
        var labels = SpurLabeller.Label(carriers, peaks, options.FrequencyTolerance);
        var relied = step.Lines is null ? null : RelatedPeaks(step.Lines, peaks, options.FrequencyTolerance);
        var judged = new List<JudgedLine>(peaks.Count);
        for (int i = 0; i < verdict.Peaks.Count; i++)
        {
            var peak = verdict.Peaks[i];
            // A carrier outside the span has no measured level, so nothing can be given relative to it.
            var dbc = labels[i].CarrierIndex is { } k && InSpan(lower, step.Carriers[k]) ? labels[i].RelativeDbc : null;
            judged.Add(new JudgedLine(peak.Frequency, peak.LevelAtLowerDbm, peak.ChangeDb, peak.Class,
                carriers.Count == 0 ? "unidentified" : labels[i].Label, dbc, relied?.Contains(i) ?? true));
        }

        return judged;
    }

    private static bool InSpan(PowerTrace trace, Frequency frequency) => frequency >= trace.Axis.Start && frequency <= trace.Axis.Stop;

    /// <summary>The carrier's level: the line found near it, or else the trace's level at the point nearest to it.</summary>
    private static double LevelNear(PowerTrace trace, IReadOnlyList<PeakPoint> peaks, Frequency frequency, Frequency tolerance)
    {
        var near = peaks.Where(p => Math.Abs(p.Frequency.Hertz - frequency.Hertz) <= tolerance.Hertz)
            .OrderBy(p => Math.Abs(p.Frequency.Hertz - frequency.Hertz)).ToList();
        if (near.Count > 0)
        {
            return near[0].LevelDb;
        }

        int nearest = 0;
        for (int i = 1; i < trace.Count; i++)
        {
            if (Math.Abs(trace.Axis.Hertz[i] - frequency.Hertz) < Math.Abs(trace.Axis.Hertz[nearest] - frequency.Hertz))
            {
                nearest = i;
            }
        }

        return trace.LevelsDb[nearest];
    }

    private static HashSet<int> RelatedPeaks(IReadOnlyList<Frequency> wanted, IReadOnlyList<PeakPoint> peaks, Frequency tolerance)
    {
        var indices = new HashSet<int>();
        foreach (var f in wanted)
        {
            int best = -1;
            for (int i = 0; i < peaks.Count; i++)
            {
                double distance = Math.Abs(peaks[i].Frequency.Hertz - f.Hertz);
                if (distance <= tolerance.Hertz && (best < 0 || distance < Math.Abs(peaks[best].Frequency.Hertz - f.Hertz)))
                {
                    best = i;
                }
            }

            if (best >= 0)
            {
                indices.Add(best);
            }
        }

        return indices;
    }

    private static List<Frequency> MissingLines(OverloadCheckStep step, IReadOnlyList<JudgedLine> lines, OverloadCheckOptions options) =>
        step.Lines is null ? []
            : [.. step.Lines.Where(f => !lines.Any(l => l.Relied && Math.Abs(l.Frequency.Hertz - f.Hertz) <= options.FrequencyTolerance.Hertz))];

    private static string Describe(OverloadCheckStep step, IReadOnlyList<JudgedLine> lines, IReadOnlyList<Frequency> missing)
    {
        var madeRelied = lines.Where(l => l.Relied && l.IsAnalyserMade).ToList();
        var madeOther = lines.Where(l => !l.Relied && l.IsAnalyserMade).ToList();
        var undecided = lines.Where(l => !l.IsAnalyserMade && l.Class != OverloadClass.Real).ToList();
        var parts = new List<string>();
        if (lines.Count == 0)
        {
            parts.Add($"no line above {step.Threshold}; nothing to judge");
        }
        else if (madeRelied.Count > 0)
        {
            parts.Add($"the analyser made {Count(madeRelied.Count, "line")} the plan relies on: {string.Join(", ", madeRelied.Select(Brief))}");
        }

        var realRelied = lines.Where(l => l.Relied && l.Class == OverloadClass.Real).ToList();
        if (realRelied.Count > 0)
        {
            parts.Add($"real: {string.Join(", ", realRelied.Select(Brief))}");
        }

        if (madeOther.Count > 0)
        {
            parts.Add($"analyser-made elsewhere: {string.Join(", ", madeOther.Select(Brief))}");
        }

        if (undecided.Count > 0)
        {
            var more = undecided.Count > ListedAtMost ? $" and {undecided.Count - ListedAtMost} more" : "";
            parts.Add($"undecided: {string.Join(", ", undecided.Take(ListedAtMost).Select(Brief))}{more}");
        }

        if (undecided.Any(l => l.Relied && l.Class == OverloadClass.HiddenByNoise))
        {
            parts.Add("a line near the raised noise floor cannot be judged: lower the RBW, or judge only lines well above the floor");
        }

        if (missing.Count > 0)
        {
            parts.Add($"not seen above {step.Threshold}: {string.Join(", ", missing)}");
        }

        if (lines.Any(l => l.IsAnalyserMade || l.Class == OverloadClass.ChangedOtherwise))
        {
            parts.Add($"the analyser is overloaded at this setting: {OverloadVerdict.OverloadAdvice}");
        }

        return string.Join("; ", parts);
    }

    private static string Brief(JudgedLine line)
    {
        var change = OverloadWords.Change(line.ChangeDb);
        var label = line.Label == "unidentified" ? "" : $" {line.Label}";
        return $"{Shown(line.Frequency)}{label} ({change}, {line.Verdict})";
    }

    /// <summary>A line's frequency for people: to the nearest hertz below 1 MHz, else to the nearest kilohertz (lines sit on trace points).</summary>
    public static string Shown(Frequency frequency) =>
        Frequency.FromHertz(frequency.Hertz < 1e6 ? Math.Round(frequency.Hertz) : Math.Round(frequency.Hertz / 1e3) * 1e3).ToString();

    private static string Count(int n, string noun) => n == 1 ? $"1 {noun}" : $"{n} {noun}s";

    private static string DetailJson(OverloadCheckStep step, SpectrumSettings raised, IReadOnlyList<JudgedLine> lines, string compensation) =>
        new JsonObject
        {
            ["attenuation_db"] = raised.InputAttenuation.Decibels - step.RaiseBy.Decibels,
            ["raised_attenuation_db"] = raised.InputAttenuation.Decibels,
            ["threshold_dbm"] = step.Threshold.Dbm,
            ["tolerance_db"] = step.ToleranceDb,
            ["compensation"] = compensation,
            ["lines"] = JudgedLineJson.Array(lines),
        }.ToJsonString();
}
