using BenchRunner.Core.Figures;
using BenchRunner.Core.Runs;
using BenchRunner.Core.Traces;

namespace BenchRunner.Execution.Running;

/// <summary>What a step of a kind the runner does not know may do: reach an instrument, keep a trace, judge a check, tell the operator.</summary>
public sealed class StepServices
{
    private readonly RunState _state;

    internal StepServices(string stepName, RunState state, PlanRunner runner)
    {
        StepName = stepName;
        _state = state;
        Runner = runner;
    }

    /// <summary>The step's name (or its word when it has none).</summary>
    public string StepName { get; }

    /// <summary>The runner carrying out the plan.</summary>
    public PlanRunner Runner { get; }

    /// <summary>The capability <typeparamref name="T"/> of the instrument in <paramref name="role"/>, already connected.</summary>
    /// <exception cref="Instruments.Errors.InstrumentException">The instrument offers no such capability.</exception>
    public T Capability<T>(string role) where T : class => PlanRunner.Capability<T>(_state, role);

    /// <summary>Keeps an acquired trace under <paramref name="traceName"/> (later checks may judge it) and publishes it.</summary>
    public ValueTask KeepTraceAsync(string role, string traceName, Trace trace, IReadOnlyList<NamedFigure> figures)
    {
        _state.Traces[traceName] = (trace, figures);
        _state.PassTraces[traceName] = (trace, figures);
        return _state.EmitAsync(now => new SweepAcquired(now, role, traceName, trace, figures) { Step = StepName });
    }

    /// <summary>Records a check's result; it counts towards the verdict.</summary>
    public ValueTask RecordCheckAsync(CheckResult result) => _state.RecordAsync(result);

    /// <summary>Tells the operator something.</summary>
    public ValueTask TellOperatorAsync(string text) => _state.EmitAsync(now => new OperatorMessage(now, text));
}
