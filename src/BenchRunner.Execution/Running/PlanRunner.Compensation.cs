using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Core.Validity;
using BenchRunner.Execution.Bench;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Running;

/// <summary>Path compensation: spectrum levels referred to the probed point, and the interlock through the compensated path.</summary>
public sealed partial class PlanRunner
{
    /// <summary>
    /// The trace referred to the probed point with the bench's compensation for <paramref name="role"/>,
    /// the line to store with it, and the flags: uncalibrated (and the raw trace) when the compensation
    /// cannot be applied, e.g. a point outside the cable table.
    /// </summary>
    private async ValueTask<(PowerTrace Trace, string Compensation, SweepFlags Flags)> CompensateAsync(string role, PowerTrace raw, RunState state)
    {
        if (_bench.CompensationOf(role) is not { } compensation)
        {
            return (raw, PathCompensation.None.Description, SweepFlags.None);
        }

        var applied = compensation.Path.Apply(raw);
        if (applied.IsAvailable)
        {
            return (applied.Value, compensation.Description, SweepFlags.None);
        }

        await state.EmitAsync(now => new OperatorMessage(now, $"{role}: levels NOT compensated: {applied.Reason}")).ConfigureAwait(false);
        return (raw, $"not compensated: {applied.Reason}", SweepFlags.Uncalibrated);
    }

    /// <summary>
    /// The level a generator setting reaches at the receiving input: through the path's gain and,
    /// when that input has a compensation, through its least loss (a path then ends at the probed point).
    /// </summary>
    private Level ArrivingLevel(Level level, SignalPath path) =>
        _bench.CompensationOf(path.To) is { } c ? level.Plus(path.Gain - c.LeastLoss) : level.Plus(path.Gain);

    private string CompensationNote(string receiver) =>
        _bench.CompensationOf(receiver) is { } c ? $" and {receiver}'s compensated input path (at least {c.LeastLoss} of loss)" : "";
}
