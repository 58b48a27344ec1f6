using BenchRunner.Cli.Output;
using BenchRunner.Core.Text;
using BenchRunner.Execution.Running;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Run;

/// <summary>Shows a run's progress as it happens, one line per event, on standard error.</summary>
public sealed class RunProgressView(TextWriter writer, bool colour) : IRunListener
{
    /// <inheritdoc/>
    public ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
    {
        switch (runEvent)
        {
            case StepStarted step:
                writer.WriteLine($"  - {step.Step}");
                break;
            case SweepAcquired sweep:
                writer.WriteLine($"    {sweep.Role}: {sweep.TraceName} ({sweep.Trace.Quantity}, {Counted.Of(sweep.Trace.Count, "point")}) acquired and stored");
                break;
            case CheckCompleted check:
                var verdict = check.Result.Passed
                    ? Display.Colour("pass", ConsoleColour.Green, colour)
                    : Display.Colour("FAIL", ConsoleColour.Red, colour);
                writer.WriteLine($"    {verdict}  {check.Result.Name}: {check.Result.Detail}");
                break;
            case OperatorMessage message:
                writer.WriteLine($"    operator: {message.Text}");
                break;
        }

        return ValueTask.CompletedTask;
    }
}
