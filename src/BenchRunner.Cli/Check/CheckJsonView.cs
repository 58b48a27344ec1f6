using System.Text.Json;
using BenchRunner.Core.Masks;

namespace BenchRunner.Cli.Check;

/// <summary>
/// Writes a check's outcome as one JSON document (field names in docs/cli.md).
/// Frequencies are in hertz and levels in dB, as plain numbers; a figure that cannot be
/// computed is null, with the reason under <c>figure_notes</c>.
/// </summary>
public static class CheckJsonView
{
    /// <summary>Writes <paramref name="outcome"/> to <paramref name="writer"/>.</summary>
    public static void Write(CheckOutcome outcome, TextWriter writer)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            var eval = outcome.Evaluation;
            json.WriteStartObject();
            json.WriteString("trace_file", outcome.TracePath);
            json.WriteString("parameter", outcome.Trace.Quantity.ToString());
            json.WriteString("mask_file", outcome.MaskPath);
            json.WriteString("mask", outcome.Mask.Name);
            json.WriteBoolean("passed", eval.Passed);
            json.WriteNumber("points", outcome.Trace.Count);
            json.WriteNumber("points_checked", eval.PointsChecked);
            WriteNullable(json, "worst_margin_db", eval.WorstMarginDb);
            WriteNullable(json, "worst_margin_hz", eval.WorstMarginAt?.Hertz);
            if (eval.WorstSide is { } side)
            {
                json.WriteString("worst_margin_side", SideName(side));
            }
            else
            {
                json.WriteNull("worst_margin_side");
            }

            json.WriteStartArray("failing_spans");
            foreach (var span in eval.FailingSpans)
            {
                json.WriteStartArray();
                json.WriteNumberValue(span.Start.Hertz);
                json.WriteNumberValue(span.Stop.Hertz);
                json.WriteEndArray();
            }

            json.WriteEndArray();
            json.WriteStartArray("failing_span_details");
            foreach (var span in eval.FailingSpans)
            {
                json.WriteStartObject();
                json.WriteNumber("start_hz", span.Start.Hertz);
                json.WriteNumber("stop_hz", span.Stop.Hertz);
                json.WriteString("side", SideName(span.Side));
                json.WriteNumber("worst_margin_db", span.WorstMarginDb);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteStartObject("figures");
            foreach (var figure in outcome.Figures)
            {
                WriteNullable(json, figure.Key.Word, figure.Value?.Value);
            }

            json.WriteEndObject();
            json.WriteStartObject("figure_notes");
            foreach (var figure in outcome.Figures.Where(f => f.Value is null && f.Reason is not null))
            {
                json.WriteString(figure.Key.Word, figure.Reason);
            }

            json.WriteEndObject();
            json.WriteEndObject();
        }

        writer.WriteLine(System.Text.Encoding.UTF8.GetString(stream.ToArray()));
    }

    private static void WriteNullable(Utf8JsonWriter json, string name, double? value)
    {
        if (value is { } v)
        {
            json.WriteNumber(name, v);
        }
        else
        {
            json.WriteNull(name);
        }
    }

    private static string SideName(LimitSide side) => side == LimitSide.Upper ? "upper" : "lower";
}
