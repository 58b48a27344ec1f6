using BenchRunner.Core.Traces;

namespace BenchRunner.Execution.Plans;

/// <summary>The words of the plan file format (docs/plan-format.md).</summary>
internal static class PlanFileKeys
{
    public const string Plan = "plan";
    public const string Description = "description";
    public const string Roles = "roles";
    public const string Steps = "steps";

    public const string Name = "name";
    public const string SetNetworkAnalyser = "set-network-analyser";
    public const string SetSpectrumAnalyser = "set-spectrum-analyser";
    public const string SetGenerator = "set-generator";
    public const string Sweep = "sweep";
    public const string CheckMask = "check-mask";
    public const string CheckFigures = "check-figures";
    public const string Wait = "wait";
    public const string Message = "message";
    public const string Repeat = "repeat";
    public const string CheckOverload = "check-overload";

    public const string Role = "role";
    public const string Start = "start";
    public const string Stop = "stop";
    public const string Points = "points";
    public const string IfBandwidth = "if-bandwidth";
    public const string Centre = "centre";
    public const string Span = "span";
    public const string Rbw = "rbw";
    public const string Attenuation = "attenuation";
    public const string ReferenceLevel = "reference-level";
    public const string FrequencyKey = "frequency";
    public const string LevelKey = "level";
    public const string Output = "output";
    public const string Traces = "traces";
    public const string TraceKey = "trace";
    public const string Mask = "mask";
    public const string Figures = "figures";
    public const string Min = "min";
    public const string Max = "max";
    public const string Target = "target";
    public const string Tolerance = "tolerance";
    public const string Times = "times";
    public const string Until = "until";
    public const string AtMost = "at-most";
    public const string RaiseBy = "raise-by";
    public const string Threshold = "threshold";
    public const string Carriers = "carriers";
    public const string Lines = "lines";

    public const int MaxPoints = 100_001;
    public const int MaxPasses = 1_000_000;

    public static readonly IReadOnlyList<string> Top = [Plan, Description, Roles, Steps];
    public static readonly IReadOnlyList<string> NetworkKeys = [Role, Start, Stop, Points, IfBandwidth];
    public static readonly IReadOnlyList<string> SpectrumKeys = [Role, Start, Stop, Centre, Span, Rbw, Attenuation, ReferenceLevel];
    public static readonly IReadOnlyList<string> GeneratorKeys = [Role, FrequencyKey, LevelKey, Output];
    public static readonly IReadOnlyList<string> SweepKeys = [Role, Traces];
    public static readonly IReadOnlyList<string> MaskKeys = [TraceKey, Mask];
    public static readonly IReadOnlyList<string> FigureKeys = [TraceKey, Figures];
    public static readonly IReadOnlyList<string> LimitKeys = [Min, Max, Target, Tolerance];
    public static readonly IReadOnlyList<string> RepeatKeys = [Times, Until, AtMost, Steps];
    public static readonly IReadOnlyList<string> OverloadKeys = [Role, TraceKey, RaiseBy, Threshold, Tolerance, Carriers, Lines];

    public static readonly IReadOnlyList<(string Word, bool Value)> OnOff = [("on", true), ("off", false)];

    public static readonly IReadOnlyList<(string Word, TraceQuantity Value)> Quantities =
    [
        ("S11", TraceQuantity.S11), ("S21", TraceQuantity.S21), ("S12", TraceQuantity.S12),
        ("S22", TraceQuantity.S22), ("power", TraceQuantity.Power),
    ];
}
