namespace BenchRunner.Execution.Plans;

/// <summary>The built-in kinds of plan step (docs/plan-format.md), each once.</summary>
public static class StepKinds
{
    /// <summary><c>set-network-analyser</c>: span, points and IF bandwidth of a network analyser.</summary>
    public static readonly StepKind SetNetworkAnalyser = new(PlanFileKeys.SetNetworkAnalyser, DrivesInstrument: true);

    /// <summary><c>set-spectrum-analyser</c>: span, RBW, input attenuation and reference level.</summary>
    public static readonly StepKind SetSpectrumAnalyser = new(PlanFileKeys.SetSpectrumAnalyser, DrivesInstrument: true);

    /// <summary><c>set-generator</c>: frequency, level and output of a signal generator.</summary>
    public static readonly StepKind SetGenerator = new(PlanFileKeys.SetGenerator, DrivesInstrument: true);

    /// <summary><c>sweep</c>: acquire traces.</summary>
    public static readonly StepKind Sweep = new(PlanFileKeys.Sweep, DrivesInstrument: true);

    /// <summary><c>check-mask</c>: judge a trace against a limit mask.</summary>
    public static readonly StepKind CheckMask = new(PlanFileKeys.CheckMask, DrivesInstrument: false);

    /// <summary><c>check-figures</c>: judge a trace's figures against their limits.</summary>
    public static readonly StepKind CheckFigures = new(PlanFileKeys.CheckFigures, DrivesInstrument: false);

    /// <summary><c>wait</c>: let time pass.</summary>
    public static readonly StepKind Wait = new(PlanFileKeys.Wait, DrivesInstrument: false);

    /// <summary><c>message</c>: tell the operator something.</summary>
    public static readonly StepKind Message = new(PlanFileKeys.Message, DrivesInstrument: false);

    /// <summary><c>repeat</c>: run inner steps again (each inner step is judged on its own by a stop).</summary>
    public static readonly StepKind Repeat = new(PlanFileKeys.Repeat, DrivesInstrument: false);

    /// <summary><c>check-overload</c>: two sweeps at two input attenuations, and the lines labelled.</summary>
    public static readonly StepKind CheckOverload = new(PlanFileKeys.CheckOverload, DrivesInstrument: true);

    /// <summary>Every built-in kind, in the order docs/plan-format.md lists them.</summary>
    public static readonly IReadOnlyList<StepKind> All =
        [SetNetworkAnalyser, SetSpectrumAnalyser, SetGenerator, Sweep, CheckMask, CheckFigures, Wait, Message, Repeat, CheckOverload];

    /// <summary>The built-in kind with <paramref name="word"/>, or null.</summary>
    public static StepKind? Find(string word) => All.FirstOrDefault(k => k.Word == word);
}
