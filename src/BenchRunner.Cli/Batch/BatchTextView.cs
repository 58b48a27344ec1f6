using System.Globalization;
using BenchRunner.Cli.Output;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Text;
using BenchRunner.Execution.Batch;
using BenchRunner.Reports.Formatting;
using BenchRunner.Reports.Lots;

namespace BenchRunner.Cli.Batch;

/// <summary>The batch's terminal view: each board's verdict as soon as it is known, the lot so far, and the lot summary.</summary>
/// <param name="writer">Where to write.</param>
/// <param name="colour">Whether ANSI colours may be used.</param>
public sealed class BatchTextView(TextWriter writer, bool colour)
{
    /// <summary>Shows one board's result and the failing checks.</summary>
    public void Board(BoardResult board)
    {
        ArgumentNullException.ThrowIfNull(board);
        var retest = board.IsRetest ? "  (retest)" : "";
        if (board.Outcome is not { } outcome || !board.HasVerdict)
        {
            writer.WriteLine($"{board.Serial,-14} {Display.Colour("NOT TESTED", ConsoleColour.Yellow, colour)}{retest}: {board.NotTestedReason}");
            return;
        }

        var verdict = board.Passed ? Display.Colour("PASS", ConsoleColour.Green, colour) : Display.Colour("FAIL", ConsoleColour.Red, colour);
        writer.WriteLine($"{board.Serial,-14} {verdict}{retest}  {outcome.Checks.Count(c => c.Passed)} of {Counted.Of(outcome.Checks.Count, "check")} passed, run {outcome.RunId}");
        foreach (var check in outcome.Checks.Where(c => !c.Passed))
        {
            writer.WriteLine($"    failed: {check.Name}: {check.Detail}");
        }
    }

    /// <summary>Shows where the lot stands: boards done and yield so far.</summary>
    public void Progress(LotSummary lot)
    {
        ArgumentNullException.ThrowIfNull(lot);
        if (lot.Yield is not { } y)
        {
            writer.WriteLine($"    lot {lot.Lot}: no board has a verdict yet");
            return;
        }

        writer.WriteLine($"    lot {lot.Lot} so far: {y.Boards} board{(y.Boards == 1 ? "" : "s")} done, {y.Passed} passed, yield {ReportFormat.Percent(y.Yield)}, first-pass yield {ReportFormat.Percent(y.FirstPassYield)}");
    }

    /// <summary>Shows the lot summary: yield, failures by check, and each limited figure's spread and Cpk.</summary>
    public void Summary(LotSummary lot, string database)
    {
        ArgumentNullException.ThrowIfNull(lot);
        writer.WriteLine();
        writer.WriteLine($"Lot {lot.Lot}");
        if (lot.Yield is not { } y)
        {
            writer.WriteLine("  No board has a verdict yet.");
        }
        else
        {
            writer.WriteLine($"  boards {y.Boards}, passed {y.Passed}, failed {y.Failed}, retested {y.Retested}");
            writer.WriteLine($"  yield {ReportFormat.Percent(y.Yield)}, first-pass yield {ReportFormat.Percent(y.FirstPassYield)} (a board counts by its latest verdict)");
            if (lot.Untested.Count > 0)
            {
                writer.WriteLine($"  left untested: {string.Join(", ", lot.Untested)}");
            }

            writer.WriteLine();
            writer.WriteLine("Failures by check (most frequent first; every test counts)");
            if (y.FailuresByCheck.Count == 0)
            {
                writer.WriteLine("  none");
            }

            foreach (var failure in y.FailuresByCheck)
            {
                writer.WriteLine($"  {failure.Failures,4}  {failure.CheckName}");
            }
        }

        if (lot.Figures.Count > 0)
        {
            writer.WriteLine();
            writer.WriteLine("Figures against their limits (each board's latest test)");
            var rows = lot.Figures.Select(f => new[]
            {
                f.Limit.CheckName,
                f.Values.Count.ToString(CultureInfo.InvariantCulture),
                f.Statistics is { } s ? QuantityFormat.Format(s.Mean, f.Limit.Unit) : "-",
                f.Statistics is { } d ? QuantityFormat.Format(d.StandardDeviation, f.Limit.Unit) : "-",
                f.Statistics is { } lo ? QuantityFormat.Format(lo.Minimum, f.Limit.Unit) : "-",
                f.Statistics is { } hi ? QuantityFormat.Format(hi.Maximum, f.Limit.Unit) : "-",
                f.Limit.Min is { } lsl ? QuantityFormat.Format(lsl, f.Limit.Unit) : "-",
                f.Limit.Max is { } usl ? QuantityFormat.Format(usl, f.Limit.Unit) : "-",
                f.Capability.IsAvailable ? f.Capability.Value.Cpk.ToString("0.00", CultureInfo.InvariantCulture) : "n/a",
            }).ToList();
            string[] header = ["figure", "n", "mean", "std dev", "min", "max", "LSL", "USL", "Cpk"];
            var widths = header.Select((h, i) => Math.Max(h.Length, rows.Max(r => r[i].Length))).ToArray();
            writer.WriteLine("  " + string.Join("  ", header.Select((h, i) => i == 0 ? h.PadRight(widths[i]) : h.PadLeft(widths[i]))));
            foreach (var row in rows)
            {
                writer.WriteLine("  " + string.Join("  ", row.Select((c, i) => i == 0 ? c.PadRight(widths[i]) : c.PadLeft(widths[i]))));
            }

            foreach (var f in lot.Figures.Where(f => !f.Capability.IsAvailable && f.Values.Count > 0))
            {
                writer.WriteLine($"  {f.Limit.CheckName}: Cpk not available ({f.Capability.Reason})");
            }
        }

        writer.WriteLine();
        writer.WriteLine($"Every run is stored in {database}. A report to open in any browser:");
        writer.WriteLine($"  benchrunner report --lot {lot.Lot} --db {database} -o {LotReportName.For(lot.Lot)}");
    }
}
