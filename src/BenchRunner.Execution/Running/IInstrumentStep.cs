namespace BenchRunner.Execution.Running;

/// <summary>
/// A plan step the runner does not know: a step of a kind added with a new instrument kind carries
/// out its own work through the <see cref="StepServices"/> it is given. Its <see cref="Plans.PlanStep.Kind"/>
/// says whether it drives an instrument (and so whether a gentle stop lets it finish).
/// </summary>
public interface IInstrumentStep
{
    /// <summary>Carries out the step.</summary>
    Task RunAsync(StepServices services, CancellationToken cancellationToken);
}
