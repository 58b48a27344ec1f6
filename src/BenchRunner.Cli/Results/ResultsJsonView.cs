using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Results;

/// <summary>JSON views of stored runs (field names in docs/cli.md).</summary>
public static class ResultsJsonView
{
    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true };

    /// <summary>Writes <c>{"runs": [...]}</c>.</summary>
    public static void WriteList(IReadOnlyList<StoredRun> runs, TextWriter writer) =>
        writer.WriteLine(new JsonObject { ["runs"] = new JsonArray(runs.Select(r => (JsonNode?)Run(r)).ToArray()) }.ToJsonString(Indented));

    /// <summary>Writes one run with its instruments, checks and sweeps.</summary>
    public static void WriteRun(StoredRun run, IReadOnlyList<InstrumentRecord> instruments, IReadOnlyList<StoredSweep> sweeps,
        IReadOnlyList<StoredFigure> figures, IReadOnlyList<StoredCheck> checks, TextWriter writer)
    {
        var document = Run(run);
        document["instruments"] = new JsonArray(instruments.Select(i => (JsonNode?)new JsonObject
        {
            ["role"] = i.Role, ["kind"] = i.Kind, ["maker"] = i.Maker, ["model"] = i.Model,
            ["serial"] = i.Serial, ["firmware"] = i.Firmware, ["connection"] = i.Connection,
            ["compensation"] = i.CompensationJson is null ? null : JsonNode.Parse(i.CompensationJson),
        }).ToArray());
        document["checks"] = new JsonArray(checks.Select(c => (JsonNode?)new JsonObject
        {
            ["name"] = c.Record.Name, ["kind"] = c.Record.Kind.ToString().ToLowerInvariant(), ["passed"] = c.Record.Passed,
            ["measured"] = c.Record.Measured, ["measured_unit"] = c.Record.MeasuredUnit, ["limit"] = c.Record.LimitText,
            ["margin"] = c.Record.Margin, ["margin_unit"] = c.Record.MarginUnit, ["worst_hz"] = c.Record.WorstFrequency?.Hertz,
            ["message"] = c.Record.Message,
            ["trace_overloaded"] = c.Record.Flags.HasFlag(CheckFlags.TraceOverloaded),
            ["detail"] = c.Record.DetailJson is null ? null : JsonNode.Parse(c.Record.DetailJson),
        }).ToArray());
        var bySweep = figures.ToLookup(f => f.SweepId);
        document["sweeps"] = new JsonArray(sweeps.Select(s =>
        {
            var values = new JsonObject();
            foreach (var f in bySweep[s.Id])
            {
                values[f.Figure.Key.Word] = f.Figure.Value?.Value;
            }

            return (JsonNode?)new JsonObject
            {
                ["sequence"] = s.Sequence, ["step"] = s.Record.StepName, ["trace"] = s.Record.TraceName,
                ["quantity"] = s.Record.Trace.Quantity.ToString(), ["points"] = s.Record.Trace.Count,
                ["acquired_utc"] = s.Record.AcquiredUtc is { } t ? Utc(t) : null, ["figures"] = values,
                ["overloaded"] = s.Record.Flags.HasFlag(SweepFlags.Overloaded),
                ["uncalibrated"] = s.Record.Flags.HasFlag(SweepFlags.Uncalibrated),
                ["compensation"] = s.Record.Compensation,
            };
        }).ToArray());
        writer.WriteLine(document.ToJsonString(Indented));
    }

    private static JsonObject Run(StoredRun run) => new()
    {
        ["id"] = run.Id,
        ["status"] = run.Status.ToString().ToLowerInvariant(),
        ["mode"] = run.Record.Mode.ToString().ToLowerInvariant(),
        ["plan"] = run.Record.PlanName,
        ["plan_sha256"] = run.PlanSha256,
        ["dut_serial"] = run.Record.DutSerial,
        ["lot"] = run.Record.Lot,
        ["operator"] = run.Record.Operator,
        ["retest"] = run.Record.IsRetest,
        ["started_utc"] = Utc(run.StartedUtc),
        ["ended_utc"] = run.EndedUtc is { } end ? Utc(end) : null,
        ["error"] = run.ErrorMessage,
    };

    private static string Utc(DateTimeOffset time) => time.UtcDateTime.ToString("yyyy-MM-ddTHH:mm:ss.fffZ", CultureInfo.InvariantCulture);
}
