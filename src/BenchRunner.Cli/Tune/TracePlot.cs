using System.Globalization;
using System.Text;
using BenchRunner.Cli.Output;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Cli.Tune;

/// <summary>
/// A compact character plot of a trace against its mask, for terminals: one column per slice of
/// the frequency axis (the highest sample of the slice, so a narrow peak is never lost), the
/// mask's upper limit drawn as <c>v</c> (the trace must stay below), its lower limit as <c>^</c>
/// (the trace must stay above), the trace as <c>*</c>, and <c>X</c> where the trace breaks the
/// mask. Plain ASCII, so it reads in any terminal and in a log.
/// </summary>
public static class TracePlot
{
    /// <summary>The trace's character.</summary>
    public const char TraceMark = '*';

    /// <summary>The character of a trace point that breaks the mask.</summary>
    public const char FailMark = 'X';

    /// <summary>The upper limit's character.</summary>
    public const char UpperMark = 'v';

    /// <summary>The lower limit's character.</summary>
    public const char LowerMark = '^';

    /// <summary>How many dB the plot shows below its top line: 50.</summary>
    public const double RangeDb = 50;

    /// <summary>
    /// Draws <paramref name="trace"/> (and <paramref name="mask"/>, when given) in
    /// <paramref name="width"/> columns by <paramref name="height"/> rows, with a level scale on
    /// the left and the frequency span below. The top line is the highest level shown rounded up
    /// to 5 dB; the plot spans <see cref="RangeDb"/> below it; lower values sit on the bottom row.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 10 columns or 4 rows.</exception>
    public static IReadOnlyList<string> Render(Trace trace, MaskEvaluation? mask, int width = 64, int height = 12, bool colour = false)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentOutOfRangeException.ThrowIfLessThan(width, 10);
        ArgumentOutOfRangeException.ThrowIfLessThan(height, 4);
        var levels = trace.LevelsDb;
        int n = levels.Length;
        var value = new double[width];
        var upper = new double?[width];
        var lower = new double?[width];
        var fails = new bool[width];
        for (int c = 0; c < width; c++)
        {
            int from = c * n / width;
            int to = Math.Max(from + 1, (c + 1) * n / width);
            value[c] = double.NegativeInfinity;
            for (int i = from; i < to && i < n; i++)
            {
                value[c] = Math.Max(value[c], levels[i]);
                if (mask is not null)
                {
                    if (mask.UpperLimitsDb[i] is { } u) upper[c] = Math.Min(upper[c] ?? u, u);
                    if (mask.LowerLimitsDb[i] is { } l) lower[c] = Math.Max(lower[c] ?? l, l);
                    if (mask.MarginsDb[i] is < 0) fails[c] = true;
                }
            }
        }

        double highest = value.Concat(upper.OfType<double>()).Concat(lower.OfType<double>()).Where(double.IsFinite).DefaultIfEmpty(0).Max();
        double top = Math.Ceiling(highest / 5) * 5;
        int Row(double db) => Math.Clamp((int)Math.Round((top - db) / RangeDb * (height - 1)), 0, height - 1);

        var grid = new char[height, width];
        for (int r = 0; r < height; r++)
        {
            for (int c = 0; c < width; c++)
            {
                grid[r, c] = ' ';
            }
        }

        for (int c = 0; c < width; c++)
        {
            int? traceRow = double.IsFinite(value[c]) ? Row(value[c]) : null;
            // A limit that falls in the trace's own cell is drawn beside it, on the side where it lies,
            // so that a limit close to a passing trace stays visible.
            if (upper[c] is { } u) grid[Nudge(Row(u), traceRow, -1, height), c] = UpperMark;
            if (lower[c] is { } l) grid[Nudge(Row(l), traceRow, +1, height), c] = LowerMark;
            if (traceRow is { } r) grid[r, c] = fails[c] ? FailMark : TraceMark;
        }

        var lines = new List<string>(height + 2);
        var unit = trace.UnitSymbol;
        for (int r = 0; r < height; r++)
        {
            double db = Math.Round(top - RangeDb * r / (height - 1)) + 0.0; // + 0.0 turns -0 into 0
            string scale = r % 3 == 0 || r == height - 1 ? $"{db.ToString("0", CultureInfo.InvariantCulture),5} {unit,-3}" : new string(' ', 9);
            var row = new StringBuilder(width);
            for (int c = 0; c < width; c++)
            {
                row.Append(grid[r, c]);
            }

            lines.Add($"{scale}|{Paint(row.ToString(), colour)}");
        }

        lines.Add(new string(' ', 9) + "+" + new string('-', width));
        string left = QuantityFormat.Format(trace.Axis.Start.Hertz, QuantityUnit.Hertz), right = QuantityFormat.Format(trace.Axis.Stop.Hertz, QuantityUnit.Hertz);
        lines.Add(new string(' ', 10) + left + right.PadLeft(Math.Max(1, width - left.Length)));
        return lines;
    }

    private static int Nudge(int limitRow, int? traceRow, int away, int height) =>
        limitRow == traceRow ? Math.Clamp(limitRow + away, 0, height - 1) : limitRow;

    private static string Paint(string row, bool colour)
    {
        if (!colour || !row.Contains(FailMark))
        {
            return row;
        }

        return row.Replace(FailMark.ToString(), Display.Colour(FailMark.ToString(), ConsoleColour.Red, true));
    }
}
