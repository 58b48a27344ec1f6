using BenchRunner.Core.Figures;
using BenchRunner.Execution.Running;

namespace BenchRunner.Cli.Demo;

/// <summary>Passes events on to a view and keeps the figures of the last S21 trace acquired.</summary>
internal sealed class FigureCapture(IRunObserver view) : IRunObserver
{
    public IReadOnlyList<NamedFigure> Figures { get; private set; } = [];

    public void OnEvent(RunEvent runEvent)
    {
        if (runEvent is SweepAcquired { Trace.Quantity: Core.Traces.TraceQuantity.S21 } sweep)
        {
            Figures = sweep.Figures;
        }

        view.OnEvent(runEvent);
    }
}
