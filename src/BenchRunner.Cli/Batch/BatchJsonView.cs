using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Execution.Batch;
using BenchRunner.Reports.Lots;

namespace BenchRunner.Cli.Batch;

/// <summary>The batch's one JSON document: this session's boards and the lot summary.</summary>
public static class BatchJsonView
{
    /// <summary>Writes the document.</summary>
    public static void Write(TextWriter writer, IReadOnlyList<BoardResult> boards, LotSummary lot, string database)
    {
        var document = new JsonObject
        {
            ["lot"] = lot.Lot,
            ["database"] = database,
            ["boards"] = new JsonArray(boards.Select(b => (JsonNode?)new JsonObject
            {
                ["serial"] = b.Serial,
                ["retest"] = b.IsRetest,
                ["status"] = b.Outcome is { } o ? o.Status.ToString().ToLowerInvariant() : "not_tested",
                ["run_id"] = b.Outcome?.RunId,
                ["failed_checks"] = new JsonArray((b.Outcome?.Checks ?? []).Where(c => !c.Passed).Select(c => (JsonNode?)c.Name).ToArray()),
                ["not_tested_reason"] = b.NotTestedReason,
            }).ToArray()),
            ["summary"] = Summary(lot),
        };
        writer.WriteLine(document.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
    }

    /// <summary>The lot summary as a JSON object.</summary>
    public static JsonObject Summary(LotSummary lot)
    {
        ArgumentNullException.ThrowIfNull(lot);
        var y = lot.Yield;
        return new JsonObject
        {
            ["boards"] = y?.Boards ?? 0,
            ["passed"] = y?.Passed ?? 0,
            ["failed"] = y?.Failed ?? 0,
            ["retested"] = y?.Retested ?? 0,
            ["yield"] = y?.Yield,
            ["first_pass_yield"] = y?.FirstPassYield,
            ["untested"] = new JsonArray(lot.Untested.Select(s => (JsonNode?)s).ToArray()),
            ["failed_serials"] = new JsonArray(lot.Boards.Where(b => !b.Passed).Select(b => (JsonNode?)b.Serial).ToArray()),
            ["failures_by_check"] = new JsonArray((y?.FailuresByCheck ?? []).Select(f => (JsonNode?)new JsonObject
            {
                ["check"] = f.CheckName, ["failures"] = f.Failures,
            }).ToArray()),
            ["figures"] = new JsonArray(lot.Figures.Select(f => (JsonNode?)new JsonObject
            {
                ["trace"] = f.Limit.Trace,
                ["key"] = f.Limit.Key,
                ["unit"] = f.Limit.Unit,
                ["count"] = f.Values.Count,
                ["mean"] = f.Statistics?.Mean,
                ["std_dev"] = f.Statistics?.StandardDeviation,
                ["min"] = f.Statistics?.Minimum,
                ["max"] = f.Statistics?.Maximum,
                ["lsl"] = f.Limit.Min,
                ["usl"] = f.Limit.Max,
                ["cp"] = f.Capability.IsAvailable ? f.Capability.Value.Cp : null,
                ["cpk"] = f.Capability.IsAvailable ? f.Capability.Value.Cpk : null,
                ["cpk_unavailable"] = f.Capability.Reason,
            }).ToArray()),
        };
    }
}
