using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Scpi;

/// <summary>Builds the exceptions of the SCPI adapter, each naming instrument, command and reply.</summary>
internal static class ScpiFailures
{
    /// <summary>
    /// The exception for error-queue entries read after <paramref name="command"/>: its code and text
    /// are those of the first real error (a queue overflow entry only when it is all there is), its
    /// message lists every entry, and its reply is the entries as received.
    /// </summary>
    public static InstrumentReportedException Reported(IReadOnlyList<ScpiError> entries, IReadOnlyList<string> replies, string instrument, string command)
    {
        var first = entries.FirstOrDefault(e => !e.IsQueueOverflow, entries[0]);
        var message = entries.Count == 1
            ? $"the instrument reported error {Describe(entries, 1)}"
            : $"the instrument reported {entries.Count} errors: {Describe(entries, entries.Count)}";
        if (entries.Any(e => e.IsQueueOverflow))
        {
            message += " (its error queue overflowed, so later errors were lost)";
        }

        return new InstrumentReportedException(first.Code, first.Text, message)
        {
            Instrument = instrument,
            Command = command,
            Reply = string.Join("; ", replies),
        };
    }

    /// <summary>Lists entries as <c>-113 "Undefined header"; -222 "Data out of range"</c>, at most <paramref name="max"/> of them.</summary>
    public static string Describe(IReadOnlyList<ScpiError> entries, int max)
    {
        var shown = string.Join("; ", entries.Take(max).Select(e => $"{e.Code} \"{e.Text}\""));
        return entries.Count > max ? $"{shown}; and {entries.Count - max} more" : shown;
    }
}
