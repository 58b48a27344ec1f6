using System.Text.Json.Nodes;
using BenchRunner.Core.Runs;
using BenchRunner.Core.Validity;

namespace BenchRunner.Execution.Running;

/// <summary>
/// The lines an overload check judged as JSON: the <c>lines</c> array of the detail the result file
/// stores, and the one <c>--json</c> prints (field names in docs/cli.md).
/// </summary>
public static class JudgedLineJson
{
    /// <summary>One object per line: <c>frequency_hz</c>, <c>level_dbm</c>, <c>change_db</c>, <c>class</c>, <c>analyser_made</c>, <c>label</c>, <c>dbc</c>, <c>relied_on</c>; levels to 0.001 dB.</summary>
    public static JsonArray Array(IReadOnlyList<JudgedLine> lines) => new([.. lines.Select(l => (JsonNode?)new JsonObject
    {
        ["frequency_hz"] = l.Frequency.Hertz,
        ["level_dbm"] = Math.Round(l.LevelDbm, 3),
        ["change_db"] = l.ChangeDb is { } c ? Math.Round(c, 3) : null,
        ["class"] = OverloadWords.Key(l.Class),
        ["analyser_made"] = l.IsAnalyserMade,
        ["label"] = l.Label,
        ["dbc"] = l.RelativeDbc is { } d ? Math.Round(d, 3) : null,
        ["relied_on"] = l.Relied,
    })]);
}
