using BenchRunner.Instruments.Capture;

namespace BenchRunner.Instruments.Tests.Capture;

/// <summary>Helpers for building and reading capture text in tests.</summary>
internal static class CaptureText
{
    public const string Header =
        "benchrunner-capture 1\n" +
        "started: 2025-03-14T09:30:00.000000Z\n" +
        "connection: memory (host end)\n" +
        "\n";

    public static CapturedSession Parse(string text, string source = "session.cap") =>
        CaptureReader.Parse(new StringReader(text), source);

    /// <summary>A capture with the standard header and the given body lines, each ended by LF.</summary>
    public static CapturedSession Body(params string[] lines) =>
        Parse(Header + string.Concat(lines.Select(l => l + "\n")));

    public static string Latin1(ReadOnlyMemory<byte> bytes) => System.Text.Encoding.Latin1.GetString(bytes.Span);
}
