using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Instruments.Profiles;

/// <summary>The words of the driver profile format.</summary>
internal static class DriverProfileKeys
{
    public const string Profile = "profile";
    public const string Description = "description";
    public const string Adapter = "adapter";
    public const string Kinds = "kinds";
    public const string FramingKey = "framing";
    public const string Timing = "timing";
    public const string Identity = "identity";
    public const string Limits = "limits";
    public const string ErrorReply = "error-reply";
    public const string BoolWordsKey = "bool-words";
    public const string OnConnect = "on-connect";

    // The keys of a raw profile before its kinds' sections, each of which is keyed by its kind's word.
    private static readonly IReadOnlyList<string> TopBeforeSections =
        [Profile, Description, Adapter, Kinds, FramingKey, Timing, Identity, Limits, ErrorReply, BoolWordsKey, OnConnect];

    /// <summary>The top-level keys of a raw profile: its own, then a section for each registered kind.</summary>
    public static IReadOnlyList<string> Top(InstrumentKindRegistry kinds) => [.. TopBeforeSections, .. kinds.Kinds.Select(k => k.Word)];

    /// <summary>True for a top-level key of either adapter's profiles: no kind may take one of these words.</summary>
    /// <remarks>A method, not a field: the two key classes' fields refer to each other, and a field here would be read half-built.</remarks>
    public static bool IsReserved(string word) =>
        TopBeforeSections.Contains(word, StringComparer.OrdinalIgnoreCase) || ScpiProfileKeys.TopBeforeSections.Contains(word, StringComparer.OrdinalIgnoreCase);

    public const string CommandEnd = "command-end";
    public const string ReplyEndKey = "reply-end";
    public const string Prompt = "prompt";
    public const string Echo = "echo";
    public const string MaxMessageBytes = "max-message-bytes";
    public const string Acknowledgement = "acknowledgement";
    public static readonly IReadOnlyList<string> FramingKeys = [CommandEnd, ReplyEndKey, Prompt, Echo, MaxMessageBytes, Acknowledgement];

    public const string CommandTimeout = "command-timeout";
    public const string SweepTimeout = "sweep-timeout";
    public const string SettleAfterSetting = "settle-after-setting";
    public const string SettleBeforeRead = "settle-before-read";
    public static readonly IReadOnlyList<string> TimingKeys = [CommandTimeout, SweepTimeout, SettleAfterSetting, SettleBeforeRead];

    public const string Query = "query";
    public const string Reply = "reply";
    public static readonly IReadOnlyList<string> IdentityKeys = [Query, Reply, .. IdentityRule.Fields];

    public const string LowestFrequency = "lowest-frequency";
    public const string HighestFrequency = "highest-frequency";
    public const string MaxInputLevel = "max-input-level";
    public const string MaxOutputLevel = "max-output-level";
    public const string MinOutputLevel = "min-output-level";
    public static readonly IReadOnlyList<string> LimitKeys = [LowestFrequency, HighestFrequency, MaxInputLevel, MaxOutputLevel, MinOutputLevel];

    public const string Setup = "setup";
    public const string IfBandwidth = "if-bandwidth";
    public const string Averages = "averages";
    public const string Sweep = "sweep";
    public const string Read = "read";
    public const string Data = "data";
    public const string DefaultPoints = "default-points";
    public static readonly IReadOnlyList<string> NetworkKeys = [Setup, IfBandwidth, Averages, Sweep, Read, Data];
    public static readonly IReadOnlyList<string> SpectrumKeys = [Setup, Sweep, Read, Data, DefaultPoints];

    public const string FrequencyKey = "frequency";
    public const string LevelKey = "level";
    public const string Output = "output";
    public static readonly IReadOnlyList<string> GeneratorKeys = [FrequencyKey, LevelKey, Output];

    public static readonly IReadOnlyList<(string Word, TraceQuantity Value)> Parameters =
        [("S11", TraceQuantity.S11), ("S21", TraceQuantity.S21), ("S12", TraceQuantity.S12), ("S22", TraceQuantity.S22)];

    public const string Layout = "layout";
    public const string Separator = "separator";
    public const string Columns = "columns";
    public const string FrequencyTolerance = "frequency-tolerance";
    public const string HeaderLines = "header-lines";
    public const string IgnoreLines = "ignore-lines";
    public const string End = "end";
    public const string EndLine = "end-line";
    public static readonly IReadOnlyList<string> DataKeys = [Layout, Separator, Columns, FrequencyTolerance, HeaderLines, IgnoreLines, End, EndLine];

    public const string Value = "value";
    public const string Scale = "scale";
    public const string Offset = "offset";
    public static readonly IReadOnlyList<string> ColumnKeys = [Value, Scale, Offset];

    public static readonly IReadOnlyList<(string Word, ReplyLayout Value)> Layouts =
        [("point-per-line", ReplyLayout.PointPerLine), ("one-line", ReplyLayout.OneLine)];

    public static readonly IReadOnlyList<(string Word, FieldSeparator Value)> Separators =
        [("whitespace", FieldSeparator.Whitespace), ("comma", FieldSeparator.Comma), ("semicolon", FieldSeparator.Semicolon)];

    public static readonly IReadOnlyList<(string Word, ReplyEnd Value)> Ends =
        [("prompt", ReplyEnd.Prompt), ("points", ReplyEnd.PointCount), ("line", ReplyEnd.EndLine)];

    public static readonly IReadOnlyList<(string Word, ColumnKind Value)> ColumnWords =
    [
        ("freq-hz", ColumnKind.FrequencyHz), ("freq-khz", ColumnKind.FrequencyKhz), ("freq-mhz", ColumnKind.FrequencyMhz),
        ("freq-ghz", ColumnKind.FrequencyGhz), ("re", ColumnKind.Real), ("im", ColumnKind.Imaginary), ("db", ColumnKind.Decibels),
        ("mag", ColumnKind.Magnitude), ("deg", ColumnKind.Degrees), ("dbm", ColumnKind.Dbm), ("skip", ColumnKind.Skip),
    ];

    public static readonly IReadOnlyList<(string Word, string Value)> Terminators = [("lf", "\n"), ("cr", "\r"), ("crlf", "\r\n")];
}
