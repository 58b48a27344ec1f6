using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Scpi;
using static BenchRunner.Instruments.Profiles.DriverProfileKeys;

namespace BenchRunner.Instruments.Profiles;

/// <summary>The words of an <c>adapter: scpi</c> profile (those it shares with raw profiles are in <see cref="DriverProfileKeys"/>).</summary>
internal static class ScpiProfileKeys
{
    public const string Scpi = "scpi";

    // The keys of a scpi profile before its kinds' sections, each of which is keyed by its kind's word.
    public static readonly IReadOnlyList<string> TopBeforeSections = [Profile, Description, Adapter, DriverProfileKeys.Kinds, FramingKey, Timing, Limits, Scpi];

    /// <summary>The top-level keys of a scpi profile: its own, then a section for each registered kind.</summary>
    public static IReadOnlyList<string> Top(InstrumentKindRegistry kinds) => [.. TopBeforeSections, .. kinds.Kinds.Select(k => k.Word)];

    public static readonly IReadOnlyList<string> FramingKeys = [CommandEnd, ReplyEndKey, MaxMessageBytes];
    public static readonly IReadOnlyList<string> TimingKeys = [CommandTimeout, SweepTimeout];

    public const string Trigger = "trigger";
    public const string DataFormat = "data-format";
    public const string ByteOrder = "byte-order";
    public const string DataFormatCommand = "data-format-command";
    public const string ByteOrderCommand = "byte-order-command";
    public const string DrainErrors = "drain-errors";
    public const string ErrorQuery = "error-query";
    public const string MaxErrorReads = "max-error-reads";
    public const string ResetOnConnect = "reset-on-connect";

    public static readonly IReadOnlyList<string> ScpiKeys =
        [Trigger, DataFormat, ByteOrder, DataFormatCommand, ByteOrderCommand, DrainErrors, ErrorQuery, MaxErrorReads, ResetOnConnect];

    public const string Start = "start";
    public const string Stop = "stop";
    public const string Points = "points";
    public const string AverageCount = "average-count";
    public const string AverageState = "average-state";
    public const string FrequencyList = "frequency-list";
    public const string ResolutionBandwidth = "resolution-bandwidth";
    public const string InputAttenuation = "input-attenuation";
    public const string ReferenceLevel = "reference-level";
    public const string PointsQuery = "points-query";

    public static readonly IReadOnlyList<string> NetworkKeys =
        [Start, Stop, Points, IfBandwidth, AverageCount, AverageState, Read, FrequencyList];

    public static readonly IReadOnlyList<string> SpectrumKeys =
        [Start, Stop, ResolutionBandwidth, InputAttenuation, ReferenceLevel, Points, PointsQuery, Read, FrequencyList];

    public static readonly IReadOnlyList<string> GeneratorKeys = DriverProfileKeys.GeneratorKeys;

    /// <summary>The word that leaves an optional command out.</summary>
    public const string None = "none";

    public static readonly IReadOnlyList<(string Word, ScpiDataFormat Value)> DataFormats =
        [("ascii", ScpiDataFormat.Ascii), ("real32", ScpiDataFormat.Real32), ("real64", ScpiDataFormat.Real64)];

    public static readonly IReadOnlyList<(string Word, ScpiByteOrder Value)> ByteOrders =
        [("normal", ScpiByteOrder.Normal), ("swapped", ScpiByteOrder.Swapped)];

    public static readonly IReadOnlyList<(string Word, TraceQuantity Value)> Parameters = DriverProfileKeys.Parameters;
}
