using System.Globalization;
using System.Text.Json.Nodes;
using BenchRunner.Core.Text;
using BenchRunner.Instruments.Capture;

namespace BenchRunner.Cli.Replay;

/// <summary>Shows a recorded session as a readable conversation, or as one JSON document.</summary>
public static class CaptureView
{
    private const int MessageWidth = 100;

    /// <summary>Writes the header, the totals and every message and event in time order.</summary>
    public static void WriteText(CapturedSession session, TextWriter writer)
    {
        var header = session.Header;
        var messages = session.Messages();
        writer.WriteLine($"Capture     {session.SourceName} (format {header.FormatVersion}{(session.IncompleteLine is null ? "" : ", last line cut off")})");
        writer.WriteLine($"Started     {header.StartedUtc.UtcDateTime.ToString("yyyy-MM-dd HH:mm:ss.fff", CultureInfo.InvariantCulture)} UTC");
        writer.WriteLine($"Connection  {header.Connection}");
        if (header.Instrument is not null) writer.WriteLine($"Instrument  {header.Instrument}");
        if (header.Note is not null) writer.WriteLine($"Note        {header.Note}");
        writer.WriteLine($"Length      {session.Duration.TotalSeconds.ToString("0.000", CultureInfo.InvariantCulture)} s: " +
                         $"{Counted.Of(Count(messages, CaptureDirection.HostToDevice), "message")} sent ({Counted.Of(session.ByteCount(CaptureDirection.HostToDevice), "byte")}), " +
                         $"{Count(messages, CaptureDirection.DeviceToHost)} received ({Counted.Of(session.ByteCount(CaptureDirection.DeviceToHost), "byte")}), " +
                         $"{Counted.Of(session.Events.Count, "event")}");
        writer.WriteLine();
        writer.WriteLine("        time  line  who     what");
        foreach (var entry in Timeline(session, messages))
        {
            writer.WriteLine($"{entry.Offset.TotalSeconds.ToString("0.000000", CultureInfo.InvariantCulture),12}  {entry.Line,4}  {entry.Who,-6}  {entry.What}");
        }
    }

    /// <summary>Writes the session as one JSON document.</summary>
    public static void WriteJson(CapturedSession session, TextWriter writer)
    {
        var header = session.Header;
        var messages = session.Messages();
        var timeline = new JsonArray();
        foreach (var entry in Timeline(session, messages))
        {
            timeline.Add(new JsonObject
            {
                ["offset_s"] = entry.Offset.TotalSeconds,
                ["line"] = entry.Line,
                ["kind"] = entry.Who,
                ["bytes"] = entry.Bytes,
                ["text"] = entry.FullText,
            });
        }

        var document = new JsonObject
        {
            ["capture_file"] = session.SourceName,
            ["format_version"] = header.FormatVersion,
            ["complete"] = session.IncompleteLine is null,
            ["started_utc"] = header.StartedUtc.UtcDateTime.ToString("O", CultureInfo.InvariantCulture),
            ["connection"] = header.Connection,
            ["instrument"] = header.Instrument,
            ["note"] = header.Note,
            ["duration_s"] = session.Duration.TotalSeconds,
            ["bytes_sent"] = session.ByteCount(CaptureDirection.HostToDevice),
            ["bytes_received"] = session.ByteCount(CaptureDirection.DeviceToHost),
            ["timeline"] = timeline,
        };
        writer.WriteLine(document.ToJsonString(new System.Text.Json.JsonSerializerOptions { WriteIndented = true }));
    }

    private static int Count(IReadOnlyList<CaptureMessage> messages, CaptureDirection direction) =>
        messages.Count(m => m.Direction == direction);

    private static IEnumerable<Entry> Timeline(CapturedSession session, IReadOnlyList<CaptureMessage> messages)
    {
        var entries = messages.Select(m => new Entry(
                m.Offset, m.Line, m.Direction == CaptureDirection.HostToDevice ? "sent" : "reply",
                m.Data.Length, Shorten(m.ToText(), m.Data.Length), m.ToText()))
            .Concat(session.Events.Select(e => new Entry(e.Offset, e.Line, "event", 0, e.Text, e.Text)));
        return entries.OrderBy(e => e.Offset).ThenBy(e => e.Line);
    }

    private static string Shorten(string text, int bytes) =>
        text.Length <= MessageWidth ? text : $"{text[..MessageWidth]}... ({Counted.Of(bytes, "byte")})";

    private sealed record Entry(TimeSpan Offset, int Line, string Who, int Bytes, string What, string FullText);
}
