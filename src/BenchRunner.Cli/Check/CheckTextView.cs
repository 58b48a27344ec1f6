using BenchRunner.Cli.Output;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Text;

namespace BenchRunner.Cli.Check;

/// <summary>Writes a check's outcome as a short human-readable report.</summary>
public static class CheckTextView
{
    /// <summary>Writes <paramref name="outcome"/> to <paramref name="writer"/>.</summary>
    public static void Write(CheckOutcome outcome, TextWriter writer, bool colour)
    {
        var trace = outcome.Trace;
        var eval = outcome.Evaluation;
        writer.WriteLine($"Trace  {outcome.TracePath}: {trace.Quantity}, {Counted.Of(trace.Count, "point")}, {Hertz(trace.Axis.Start)} to {Hertz(trace.Axis.Stop)}");
        writer.WriteLine($"Mask   {outcome.MaskPath}: \"{outcome.Mask.Name}\", {eval.PointsChecked} of {Counted.Of(trace.Count, "point")} under a limit");
        writer.WriteLine();

        var verdict = eval.Passed
            ? Display.Colour("PASS", ConsoleColour.Green, colour)
            : Display.Colour("FAIL", ConsoleColour.Red, colour);
        writer.WriteLine($"  Verdict        {verdict}");
        if (eval.WorstMarginDb is { } worst && eval.WorstMarginAt is { } at)
        {
            writer.WriteLine($"  Worst margin   {QuantityFormat.Signed(worst, QuantityUnit.Decibel)} at {Hertz(at)}{SideText(eval.WorstSide)}");
        }

        if (eval.FailingSpans.Count == 0)
        {
            writer.WriteLine("  Failing spans  none");
        }
        else
        {
            writer.WriteLine($"  Failing spans  {eval.FailingSpans.Count}");
            foreach (var span in eval.FailingSpans)
            {
                var range = span.Start == span.Stop
                    ? $"at {Hertz(span.Start)}"
                    : $"{Hertz(span.Start)} to {Hertz(span.Stop)}";
                writer.WriteLine($"    {range}, {Side(span.Side)} limit, worst {QuantityFormat.Signed(span.WorstMarginDb, QuantityUnit.Decibel)}");
            }
        }

        writer.WriteLine();
        writer.WriteLine("  Figures");
        int width = outcome.Figures.Max(f => f.Label.Length);
        foreach (var figure in outcome.Figures)
        {
            var value = figure.Value is { } v
                ? QuantityFormat.Format(v)
                : $"not available: {figure.Reason}";
            writer.WriteLine($"    {figure.Label.PadRight(width)}  {value}");
        }
    }

    private static string Hertz(Frequency frequency) => QuantityFormat.Format(frequency.Hertz, QuantityUnit.Hertz);

    private static string SideText(LimitSide? side) => side is { } s ? $" ({Side(s)} limit)" : "";

    private static string Side(LimitSide side) => side == LimitSide.Upper ? "upper" : "lower";
}
