using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Validity;
using BenchRunner.Execution.Running;
using BenchRunner.Core.Runs;

namespace BenchRunner.Cli.Output;

/// <summary>The lines an overload check judged, as a small table or as JSON, from a run's outcome or from the result file.</summary>
public static class OverloadLinesView
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    /// <summary>Writes one row per line: frequency, level, change, verdict, name, dBc, and whether the plan relies on it.</summary>
    public static void Write(IReadOnlyList<JudgedLine> lines, TextWriter writer, string indent, bool colour) =>
        WriteRows([.. lines.Select(l => new Row(l.Frequency.Hertz, l.LevelDbm, l.ChangeDb, l.Verdict, l.IsAnalyserMade, l.Label, l.RelativeDbc, l.Relied))],
            writer, indent, colour);

    /// <summary>As <see cref="Write"/>, from the detail JSON an overload check stored; writes nothing when there is none.</summary>
    public static void WriteStored(string? detailJson, TextWriter writer, string indent, bool colour)
    {
        if (ParseStored(detailJson) is { Count: > 0 } rows)
        {
            WriteRows(rows, writer, indent, colour);
        }
    }

    /// <summary>The lines as a JSON array (field names in docs/cli.md).</summary>
    public static JsonArray Json(IReadOnlyList<JudgedLine> lines) => JudgedLineJson.Array(lines);

    private static List<Row>? ParseStored(string? detailJson)
    {
        if (detailJson is null)
        {
            return null;
        }

        using var document = JsonDocument.Parse(detailJson);
        if (!document.RootElement.TryGetProperty("lines", out var lines) || lines.ValueKind != JsonValueKind.Array)
        {
            return null;
        }

        var rows = new List<Row>();
        foreach (var line in lines.EnumerateArray())
        {
            var key = line.GetProperty("class").GetString() ?? "";
            var verdict = Enum.GetValues<OverloadClass>().FirstOrDefault(c => OverloadWords.Key(c) == key);
            rows.Add(new Row(
                line.GetProperty("frequency_hz").GetDouble(),
                line.GetProperty("level_dbm").GetDouble(),
                Number(line, "change_db"),
                OverloadWords.Describe(verdict),
                line.GetProperty("analyser_made").GetBoolean(),
                line.GetProperty("label").GetString() ?? "",
                Number(line, "dbc"),
                line.GetProperty("relied_on").GetBoolean()));
        }

        return rows;
    }

    private static double? Number(JsonElement line, string name) =>
        line.TryGetProperty(name, out var value) && value.ValueKind == JsonValueKind.Number ? value.GetDouble() : null;

    private static void WriteRows(IReadOnlyList<Row> rows, TextWriter writer, string indent, bool colour)
    {
        writer.WriteLine($"{indent}{"line at",-14}  {"level",11}  {"change",9}  {"verdict",-30}  {"name",-16}  {"dBc",7}");
        foreach (var r in rows)
        {
            var verdict = r.AnalyserMade ? Display.Colour($"{r.Verdict,-30}", ConsoleColour.Red, colour) : $"{r.Verdict,-30}";
            var change = OverloadWords.Change(r.ChangeDb);
            var dbc = r.Dbc is { } d ? d.ToString("0.0", Invariant) : "-";
            var shown = PlanRunner.Shown(Frequency.FromHertz(r.Hertz));
            writer.WriteLine($"{indent}{shown,-14}  {QuantityFormat.Signed(Math.Round(r.LevelDbm, 1), QuantityUnit.DecibelMilliwatt),11}  {change,9}  {verdict}  {r.Label,-16}  {dbc,7}{(r.Relied ? "  relied on" : "")}");
        }
    }

    private sealed record Row(double Hertz, double LevelDbm, double? ChangeDb, string Verdict, bool AnalyserMade, string Label, double? Dbc, bool Relied);
}
