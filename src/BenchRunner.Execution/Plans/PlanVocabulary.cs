using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// The words a plan file may use: the kinds of instrument its roles may name and the kinds of step
/// it may take. <see cref="BuiltIn"/> holds BenchRunner's own; a new instrument kind adds itself and
/// its steps with <see cref="WithKinds"/> and <see cref="WithStep"/>. A vocabulary never changes:
/// each call returns a new one.
/// </summary>
public sealed class PlanVocabulary
{
    private PlanVocabulary(InstrumentKindRegistry kinds, IReadOnlyList<StepKind> steps)
    {
        Kinds = kinds;
        Steps = steps;
    }

    /// <summary>BenchRunner's own kinds of instrument and step.</summary>
    public static PlanVocabulary BuiltIn { get; } = new(InstrumentKindRegistry.BuiltIn, StepKinds.All);

    /// <summary>The kinds of instrument roles may name.</summary>
    public InstrumentKindRegistry Kinds { get; }

    /// <summary>The kinds of step, built-in first.</summary>
    public IReadOnlyList<StepKind> Steps { get; }

    /// <summary>The step words, in order.</summary>
    public IReadOnlyList<string> StepWords => [.. Steps.Select(s => s.Word)];

    /// <summary>This vocabulary with the instrument kinds of <paramref name="kinds"/>.</summary>
    public PlanVocabulary WithKinds(InstrumentKindRegistry kinds) => new(kinds ?? throw new ArgumentNullException(nameof(kinds)), Steps);

    /// <summary>This vocabulary with one more kind of step, which must know how to read itself.</summary>
    /// <exception cref="ArgumentException">No reader, or its word is already a step's or a step key's.</exception>
    public PlanVocabulary WithStep(StepKind step)
    {
        ArgumentNullException.ThrowIfNull(step);
        if (step.Read is null)
        {
            throw new ArgumentException($"the step kind \"{step.Word}\" has no reader, so a plan file cannot use it", nameof(step));
        }

        if (Steps.Any(s => s.Word == step.Word) || step.Word == PlanFileKeys.Name)
        {
            throw new ArgumentException($"\"{step.Word}\" is already a word of plan steps", nameof(step));
        }

        return new PlanVocabulary(Kinds, [.. Steps, step]);
    }
}
