using System.Globalization;
using BenchRunner.Cli.Output;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Results;

/// <summary>Text views of stored runs: a list, and one run in detail with its figures sweep by sweep.</summary>
public static class ResultsTextView
{
    /// <summary>The figures shown per sweep in a run's detail, in this order, when present.</summary>
    private static readonly FigureKey[] SweepFigures =
        [FigureKeys.CentreFrequency, FigureKeys.Bandwidth3Db, FigureKeys.InsertionLoss, FigureKeys.LoadedQ, FigureKeys.PeakPower, FigureKeys.NoiseFloor];

    /// <summary>One line per run, newest first.</summary>
    public static void WriteList(IReadOnlyList<StoredRun> runs, string database, TextWriter writer)
    {
        if (runs.Count == 0)
        {
            writer.WriteLine($"No runs in {database} match.");
            return;
        }

        writer.WriteLine($"{"run",5}  {"started (UTC)",-19}  {"status",-11}  {"mode",-6}  {"DUT",-12}  {"lot",-10}  plan");
        foreach (var run in runs)
        {
            var r = run.Record;
            writer.WriteLine($"{run.Id,5}  {Time(run.StartedUtc),-19}  {Status(run.Status),-11}  {r.Mode.ToString().ToLowerInvariant(),-6}  {r.DutSerial ?? "-",-12}  {r.Lot ?? "-",-10}  {r.PlanName}{(r.IsRetest ? " (retest)" : "")}");
        }
    }

    /// <summary>A run: who, what and when; its instruments; its checks; and its sweeps with their main figures.</summary>
    public static void WriteRun(StoredRun run, IReadOnlyList<InstrumentRecord> instruments, IReadOnlyList<StoredSweep> sweeps,
        IReadOnlyList<StoredFigure> figures, IReadOnlyList<StoredCheck> checks, TextWriter writer)
    {
        var r = run.Record;
        writer.WriteLine($"Run {run.Id}: {Status(run.Status)}");
        writer.WriteLine($"  plan       {r.PlanName} (SHA-256 {run.PlanSha256[..16]}...)");
        writer.WriteLine($"  mode       {r.Mode.ToString().ToLowerInvariant()}{(r.IsRetest ? ", retest" : "")}");
        writer.WriteLine($"  DUT        {r.DutSerial ?? "-"}   lot {r.Lot ?? "-"}   operator {r.Operator ?? "-"}");
        writer.WriteLine($"  time       {Time(run.StartedUtc)} to {(run.EndedUtc is { } end ? Time(end) : "-")} UTC");
        writer.WriteLine($"  software   {r.SoftwareVersion} on {r.Host}{(r.BenchName is null ? "" : $", bench {r.BenchName}")}");
        if (run.ErrorMessage is not null)
        {
            writer.WriteLine($"  error      {run.ErrorMessage}");
        }

        foreach (var i in instruments)
        {
            writer.WriteLine($"  instrument {i.Role}: {i.Kind}, {i.Maker} {i.Model} serial {i.Serial} firmware {i.Firmware}{(i.Connection is null ? "" : $" on {i.Connection}")}");
        }

        bool tuning = r.Mode == RunMode.Tuning;
        var listed = tuning ? TuningTrajectoryView.LastSweepChecks(sweeps, checks) : checks;
        if (listed.Count > 0)
        {
            writer.WriteLine();
            writer.WriteLine(tuning ? "  Checks of the last sweep" : "  Checks");
            foreach (var c in listed)
            {
                var margin = c.Record.Margin is { } m ? $", margin {QuantityFormat.Format(m, c.Record.MarginUnit)}" : "";
                var flagged = c.Record.Flags.HasFlag(CheckFlags.TraceOverloaded) ? "  [FLAGGED: trace measured while overloaded]" : "";
                writer.WriteLine($"    {(c.Record.Passed ? "pass" : "FAIL")}  {c.Record.Name}{(c.Record.LimitText is null ? "" : $" ({c.Record.LimitText})")}{margin}{flagged}");
                if (c.Record.Message is not null)
                {
                    writer.WriteLine($"          {c.Record.Message}");
                }

                OverloadLinesView.WriteStored(c.Record.DetailJson, writer, "          ", colour: false);
            }
        }

        if (tuning)
        {
            TuningTrajectoryView.Write(sweeps, figures, checks, writer);
        }
        else if (sweeps.Count > 0)
        {
            var bySweep = figures.ToLookup(f => f.SweepId);
            var shown = SweepFigures.Where(key => figures.Any(f => f.Figure.Key == key && f.Figure.Value is not null)).ToList();
            writer.WriteLine();
            writer.WriteLine($"  Sweeps ({sweeps.Count})");
            // The trace column is as wide as the longest trace name (at least "trace"), so names such as spectrum-raised stay aligned.
            int traceWidth = sweeps.Select(TraceName).Append("trace").Max(n => n.Length);
            writer.WriteLine("    " + string.Join("  ", new[] { $"{"#",4}", $"{"acquired",-12}", "trace".PadRight(traceWidth) }.Concat(shown.Select(k => $"{k.Word,16}"))));
            foreach (var s in sweeps)
            {
                var values = bySweep[s.Id].ToDictionary(f => f.Figure.Key, f => f.Figure);
                var cells = shown.Select(key => values.TryGetValue(key, out var f) && f.Value is { } v ? QuantityFormat.Format(v) : "-");
                var acquired = s.Record.AcquiredUtc is { } t ? t.UtcDateTime.ToString("HH:mm:ss.fff", CultureInfo.InvariantCulture) : "-";
                writer.WriteLine("    " + string.Join("  ", new[] { $"{s.Sequence,4}", $"{acquired,-12}", TraceName(s).PadRight(traceWidth) }.Concat(cells.Select(c => $"{c,16}"))));
            }

            foreach (var s in sweeps.Where(s => s.Record.Flags != SweepFlags.None || s.Record.Compensation is not (null or "no path compensation")))
            {
                var notes = new List<string>();
                if (s.Record.Flags != SweepFlags.None)
                {
                    notes.Add(s.Record.Flags.ToString().ToLowerInvariant());
                }

                if (s.Record.Compensation is { } compensation)
                {
                    notes.Add(compensation);
                }

                writer.WriteLine($"    #{s.Sequence} {s.Record.TraceName}: {string.Join("; ", notes)}");
            }
        }
    }

    private static string Time(DateTimeOffset time) => time.UtcDateTime.ToString("yyyy-MM-dd HH:mm:ss", CultureInfo.InvariantCulture);

    private static string Status(RunStatus status) => status == RunStatus.Failed ? "FAILED" : status.ToString().ToLowerInvariant();

    private static string TraceName(StoredSweep sweep) => sweep.Record.TraceName ?? sweep.Record.Trace.Quantity.ToString();
}
