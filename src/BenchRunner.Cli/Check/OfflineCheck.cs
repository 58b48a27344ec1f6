using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Text;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;

namespace BenchRunner.Cli.Check;

/// <summary>
/// Reads a saved trace and a mask, picks the trace the mask applies to, and computes the
/// verdict and the figures. Bad files raise <see cref="InputFormatException"/>; a mismatch
/// between the request and the files raises <see cref="UsageException"/>.
/// </summary>
public static class OfflineCheck
{
    /// <summary>Runs the check.</summary>
    /// <param name="tracePath">Touchstone or CSV trace file.</param>
    /// <param name="maskPath">Mask file.</param>
    /// <param name="parameter">The trace to check, or null to let the mask or the file decide.</param>
    public static CheckOutcome Run(string tracePath, string maskPath, TraceQuantity? parameter)
    {
        var traces = TraceFile.Read(tracePath);
        var mask = MaskFile.Load(maskPath);
        var trace = ChooseTrace(traces, mask, parameter, tracePath);

        MaskEvaluation evaluation;
        try
        {
            evaluation = mask.Evaluate(trace);
        }
        catch (ArgumentException ex)
        {
            throw new UsageException($"mask \"{mask.Name}\" cannot be applied to {trace.Quantity} of {tracePath}: {ex.Message}");
        }

        if (evaluation.PointsChecked == 0)
        {
            throw new UsageException(
                $"mask \"{mask.Name}\" ({maskPath}) covers none of the {Counted.Of(trace.Count, "point")} of {tracePath} " +
                $"({trace.Axis.Start} to {trace.Axis.Stop}); check the mask's corner frequencies or the sweep.");
        }

        var figures = trace is PowerTrace power ? FigureSummary.ForSpectrum(power) : FigureSummary.ForFilter(trace);
        return new CheckOutcome(tracePath, maskPath, mask, trace, evaluation, figures);
    }

    private static Trace ChooseTrace(TraceSet traces, LimitMask mask, TraceQuantity? asked, string tracePath)
    {
        if (asked is { } a && mask.Parameter is { } m && a != m)
        {
            throw new UsageException($"mask \"{mask.Name}\" applies to {m}, but --param asks for {a}.");
        }

        var wanted = asked ?? mask.Parameter;
        string held = string.Join(", ", traces.Traces.Select(t => t.Quantity));
        if (wanted is { } w)
        {
            return traces.Find(w)
                ?? throw new UsageException($"{tracePath} holds no {w} trace (it holds {held}).");
        }

        return traces.Find(TraceQuantity.S21)
            ?? (traces.Traces.Count == 1
                ? traces.Traces[0]
                : throw new UsageException($"{tracePath} holds {held}; choose one with --param."));
    }
}
