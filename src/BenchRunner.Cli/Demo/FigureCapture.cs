using BenchRunner.Core.Figures;
using BenchRunner.Execution.Running;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Demo;

/// <summary>Passes events on to a view and keeps the figures of the last S21 trace acquired.</summary>
internal sealed class FigureCapture : IRunListener
{
    public IReadOnlyList<NamedFigure> Figures { get; private set; } = [];

    public ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
    {
        if (runEvent is SweepAcquired { Trace.Quantity: Core.Traces.TraceQuantity.S21 } sweep)
        {
            Figures = sweep.Figures;
        }

        return ValueTask.CompletedTask;
    }
}
