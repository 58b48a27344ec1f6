using System.Globalization;
using System.Text;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// Writes a plan built in code as plan-file text (docs/plan-format.md) that reads back to the same
/// plan: values in their base units with every digit kept (hertz, dB, dBm, seconds), names quoted
/// where YAML needs it. Used where a verb builds its plan as an object (<c>overload</c>) so the text
/// stored with the run is exactly what ran.
/// </summary>
/// <remarks>
/// Steps that refer to other files (<c>check-mask</c>) or nest steps (<c>repeat</c>), and figure
/// checks, are not written: a plan with them comes from a file, whose text is stored as it is.
/// </remarks>
public static class PlanWriter
{
    /// <summary>The plan as plan-file text.</summary>
    /// <exception cref="NotSupportedException">A step this writer does not write (see remarks).</exception>
    public static string Write(TestPlan plan, string? comment = null)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var text = new StringBuilder();
        if (comment is not null)
        {
            Line(text, $"# {comment}");
        }

        Line(text, $"{PlanFileKeys.Plan}: {Scalar(plan.Name)}");
        if (plan.Description is { } description)
        {
            Line(text, $"{PlanFileKeys.Description}: {Scalar(description)}");
        }

        Line(text, $"{PlanFileKeys.Roles}:");
        foreach (var role in plan.Roles)
        {
            Line(text, $"  {Scalar(role.Role)}: {role.Kind.Word}");
        }

        Line(text, $"{PlanFileKeys.Steps}:");
        foreach (var step in plan.Steps)
        {
            var fields = Fields(step);
            var name = step.Name is { } n ? $"{PlanFileKeys.Name}: {Scalar(n)}, " : "";
            Line(text, $"  - {{ {name}{step.Word}: {fields} }}");
        }

        return text.ToString();
    }

    private static string Fields(PlanStep step) => step switch
    {
        GeneratorSetup g => Map(
            (PlanFileKeys.Role, Scalar(g.Role)),
            (PlanFileKeys.FrequencyKey, g.Frequency is { } f ? Hz(f) : null),
            (PlanFileKeys.LevelKey, g.Level is { } l ? Dbm(l) : null),
            (PlanFileKeys.Output, g.Output is { } on ? (on ? "on" : "off") : null)),
        SpectrumAnalyserSetup s => Map(
            (PlanFileKeys.Role, Scalar(s.Role)),
            (PlanFileKeys.Start, Hz(s.Start)),
            (PlanFileKeys.Stop, Hz(s.Stop)),
            (PlanFileKeys.Rbw, s.Rbw is { } rbw ? Hz(rbw) : null),
            (PlanFileKeys.Attenuation, s.Attenuation is { } a ? Db(a.Decibels) : null),
            (PlanFileKeys.ReferenceLevel, s.ReferenceLevel is { } r ? Dbm(r) : null)),
        NetworkAnalyserSetup n => Map(
            (PlanFileKeys.Role, Scalar(n.Role)),
            (PlanFileKeys.Start, Hz(n.Start)),
            (PlanFileKeys.Stop, Hz(n.Stop)),
            (PlanFileKeys.Points, n.Points.ToString(CultureInfo.InvariantCulture)),
            (PlanFileKeys.IfBandwidth, n.IfBandwidth is { } ifbw ? Hz(ifbw) : null)),
        SweepStep s => Map(
            (PlanFileKeys.Role, Scalar(s.Role)),
            (PlanFileKeys.Traces, $"{{ {string.Join(", ", s.Traces.Select(t => $"{QuantityWord(t)}: {Scalar(t.Name)}"))} }}")),
        OverloadCheckStep o => Map(
            (PlanFileKeys.Role, Scalar(o.Role)),
            (PlanFileKeys.TraceKey, Scalar(o.Trace.Name)),
            (PlanFileKeys.RaiseBy, Db(o.RaiseBy.Decibels)),
            (PlanFileKeys.Threshold, Dbm(o.Threshold)),
            (PlanFileKeys.Tolerance, Db(o.ToleranceDb)),
            (PlanFileKeys.Carriers, o.Carriers.Count == 0 ? null : $"[{string.Join(", ", o.Carriers.Select(Hz))}]"),
            (PlanFileKeys.Lines, o.Lines is { } lines ? $"[{string.Join(", ", lines.Select(Hz))}]" : null)),
        WaitStep w => $"{Number(w.Duration.TotalSeconds)} s",
        MessageStep m => Scalar(m.Text),
        _ => throw new NotSupportedException($"a \"{step.Word}\" step is not written by the plan writer; such plans come from a file"),
    };

    private static string QuantityWord(NamedTrace trace) =>
        PlanFileKeys.Quantities.First(q => q.Value == trace.Quantity).Word;

    private static string Map(params (string Key, string? Value)[] fields) =>
        $"{{ {string.Join(", ", fields.Where(f => f.Value is not null).Select(f => $"{f.Key}: {f.Value}"))} }}";

    private static string Hz(Frequency frequency) => $"{Number(frequency.Hertz)} Hz";

    private static string Dbm(Level level) => $"{Number(level.Dbm)} dBm";

    private static string Db(double decibels) => $"{Number(decibels)} dB";

    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>A YAML scalar: plain when it is safely plain, else double-quoted with escapes.</summary>
    private static string Scalar(string value)
    {
        bool plain = value.Length > 0
            && value.All(c => char.IsLetterOrDigit(c) || c is '-' or '_' or '.' or ' ' or '/')
            && !char.IsWhiteSpace(value[0]) && !char.IsWhiteSpace(value[^1])
            && value[0] is not ('-' or '.')
            && !double.TryParse(value, NumberStyles.Float, CultureInfo.InvariantCulture, out _)
            && value is not ("true" or "false" or "null" or "yes" or "no" or "on" or "off" or "~");
        if (plain)
        {
            return value;
        }

        var escaped = new StringBuilder("\"");
        foreach (var c in value)
        {
            escaped.Append(c switch
            {
                '"' => "\\\"",
                '\\' => "\\\\",
                '\n' => "\\n",
                '\t' => "\\t",
                _ when char.IsControl(c) => $"\\u{(int)c:x4}",
                _ => c.ToString(),
            });
        }

        return escaped.Append('"').ToString();
    }

    private static void Line(StringBuilder text, string line) => text.Append(line).Append('\n');
}
