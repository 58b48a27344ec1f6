using BenchRunner.Core.Traces;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Columns;

/// <summary>
/// The words the file uses for enumerated values. They are part of the file format
/// (docs/storage.md), so they never follow a rename in code.
/// </summary>
internal static class ColumnText
{
    public static string From(RunStatus status) => status switch
    {
        RunStatus.Running => "running",
        RunStatus.Passed => "passed",
        RunStatus.Failed => "failed",
        RunStatus.Error => "error",
        RunStatus.Interrupted => "interrupted",
        RunStatus.Stopped => "stopped",
        _ => throw new ArgumentOutOfRangeException(nameof(status), status, "Not a run status."),
    };

    public static RunStatus Status(string text) => text switch
    {
        "running" => RunStatus.Running,
        "passed" => RunStatus.Passed,
        "failed" => RunStatus.Failed,
        "error" => RunStatus.Error,
        "interrupted" => RunStatus.Interrupted,
        "stopped" => RunStatus.Stopped,
        _ => throw new FormatException($"unknown run status \"{text}\""),
    };

    public static string From(RunMode mode) => mode switch
    {
        RunMode.Single => "single",
        RunMode.Tuning => "tuning",
        RunMode.Batch => "batch",
        _ => throw new ArgumentOutOfRangeException(nameof(mode), mode, "Not a run mode."),
    };

    public static RunMode Mode(string text) => text switch
    {
        "single" => RunMode.Single,
        "tuning" => RunMode.Tuning,
        "batch" => RunMode.Batch,
        _ => throw new FormatException($"unknown run mode \"{text}\""),
    };

    public static string From(CheckKind kind) => kind switch
    {
        CheckKind.Mask => "mask",
        CheckKind.FigureLimit => "figure_limit",
        CheckKind.Overload => "overload",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Not a check kind."),
    };

    public static CheckKind CheckKindOf(string text) => text switch
    {
        "mask" => CheckKind.Mask,
        "figure_limit" => CheckKind.FigureLimit,
        "overload" => CheckKind.Overload,
        _ => throw new FormatException($"unknown check kind \"{text}\""),
    };

    public static string From(TraceQuantity quantity) => quantity switch
    {
        TraceQuantity.S11 => "S11",
        TraceQuantity.S21 => "S21",
        TraceQuantity.S12 => "S12",
        TraceQuantity.S22 => "S22",
        TraceQuantity.Power => "power",
        _ => throw new ArgumentOutOfRangeException(nameof(quantity), quantity, "Not a trace quantity."),
    };

    public static TraceQuantity Quantity(string text) => text switch
    {
        "S11" => TraceQuantity.S11,
        "S21" => TraceQuantity.S21,
        "S12" => TraceQuantity.S12,
        "S22" => TraceQuantity.S22,
        "power" => TraceQuantity.Power,
        _ => throw new FormatException($"unknown trace quantity \"{text}\""),
    };

    public static string From(FrequencyAxisKind kind) => kind switch
    {
        FrequencyAxisKind.Linear => "linear",
        FrequencyAxisKind.Logarithmic => "log",
        FrequencyAxisKind.List => "list",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Not an axis kind."),
    };

    public static FrequencyAxisKind AxisKind(string text) => text switch
    {
        "linear" => FrequencyAxisKind.Linear,
        "log" => FrequencyAxisKind.Logarithmic,
        "list" => FrequencyAxisKind.List,
        _ => throw new FormatException($"unknown axis kind \"{text}\""),
    };
}
