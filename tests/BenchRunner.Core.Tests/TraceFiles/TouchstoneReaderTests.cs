using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.TraceFiles;

namespace BenchRunner.Core.Tests.TraceFiles;

/// <summary>
/// Reading Touchstone text. The topics are split over TouchstoneReaderTests.*.cs; this file holds
/// the helpers they share.
/// </summary>
public partial class TouchstoneReaderTests
{
    private static TouchstoneData Parse(string text, string name = "test.s2p", int? ports = 2) =>
        TouchstoneReader.Parse(new StringReader(text), name, ports);

    private static InputFormatException ParseFails(string text, string name, int? ports) =>
        Assert.Throws<InputFormatException>(() => TouchstoneReader.Parse(new StringReader(text), name, ports));

    private static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";
}
