using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Core.Masks;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.LimitRecords;

/// <summary>
/// The masks and figure limits of a plan, kept with each run (in the run's <c>extra_json</c>
/// under <see cref="JsonKey"/>) so that a report can draw a trace against its mask and a lot's
/// figures against their limits long after the plan's mask files have moved.
/// </summary>
public sealed class PlanLimits
{
    /// <summary>The key of the limits object inside a run's extra JSON document.</summary>
    public const string JsonKey = "limits";

    /// <summary>Creates the record.</summary>
    public PlanLimits(IReadOnlyList<RecordedMask> masks, IReadOnlyList<RecordedFigureLimit> figures)
    {
        Masks = masks ?? throw new ArgumentNullException(nameof(masks));
        Figures = figures ?? throw new ArgumentNullException(nameof(figures));
    }

    /// <summary>The plan's mask checks, in plan order.</summary>
    public IReadOnlyList<RecordedMask> Masks { get; }

    /// <summary>The plan's figure limits, in plan order; a figure limited twice appears twice.</summary>
    public IReadOnlyList<RecordedFigureLimit> Figures { get; }

    /// <summary>The masks and figure limits of <paramref name="plan"/> (repeat blocks included).</summary>
    public static PlanLimits From(TestPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var masks = new List<RecordedMask>();
        var figures = new List<RecordedFigureLimit>();
        foreach (var step in plan.AllSteps())
        {
            switch (step)
            {
                case MaskCheck mask:
                    masks.Add(new RecordedMask(step.Name ?? step.Word, mask.Trace, MaskFile.Format(mask.Mask)));
                    break;
                case FigureCheck check:
                    figures.AddRange(check.Limits.Select(l => new RecordedFigureLimit(check.Trace, l.Key.Word, l.Unit.Symbol, l.Min, l.Max, l.Target)));
                    break;
            }
        }

        return new PlanLimits(masks, figures);
    }

    /// <summary>A run's extra JSON document holding these limits under <see cref="JsonKey"/>.</summary>
    public string ToRunJson()
    {
        var limits = new JsonObject
        {
            ["masks"] = new JsonArray(Masks.Select(m => (JsonNode?)new JsonObject
            {
                ["step"] = m.Step, ["trace"] = m.Trace, ["mask"] = m.MaskText,
            }).ToArray()),
            ["figures"] = new JsonArray(Figures.Select(f => (JsonNode?)new JsonObject
            {
                ["trace"] = f.Trace, ["key"] = f.Key, ["unit"] = f.Unit, ["min"] = f.Min, ["max"] = f.Max, ["target"] = f.Target,
            }).ToArray()),
        };
        return new JsonObject { [JsonKey] = limits }.ToJsonString();
    }

    /// <summary>
    /// The limits recorded in a run's extra JSON document; null when there is none, or when the
    /// document does not hold limits in the form <see cref="ToRunJson"/> writes.
    /// </summary>
    public static PlanLimits? FromRunJson(string? extraJson)
    {
        if (string.IsNullOrWhiteSpace(extraJson))
        {
            return null;
        }

        try
        {
            if (JsonNode.Parse(extraJson)?[JsonKey] is not JsonObject limits)
            {
                return null;
            }

            var masks = (limits["masks"] as JsonArray ?? []).Select(m => new RecordedMask(
                Text(m, "step"), Text(m, "trace"), Text(m, "mask"))).ToList();
            var figures = (limits["figures"] as JsonArray ?? []).Select(f => new RecordedFigureLimit(
                Text(f, "trace"), Text(f, "key"), Text(f, "unit"), Number(f, "min"), Number(f, "max"), Number(f, "target"))).ToList();
            return new PlanLimits(masks, figures);
        }
        catch (Exception e) when (e is JsonException or InvalidOperationException or FormatException)
        {
            return null;
        }
    }

    private static string Text(JsonNode? node, string key) =>
        node?[key]?.GetValue<string>() ?? throw new FormatException($"the recorded limits lack \"{key}\"");

    private static double? Number(JsonNode? node, string key) =>
        node?[key]?.GetValue<double>();
}
