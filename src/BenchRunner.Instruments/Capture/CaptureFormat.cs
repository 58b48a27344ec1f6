using System.Globalization;
using System.Text;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// The spelling of the capture format (see docs/capture-format.md): magic line, header keys,
/// line markers, time offsets and the two payload encodings. Shared by the writer and the reader
/// so that the two cannot drift apart.
/// </summary>
internal static class CaptureFormat
{
    public const string Magic = "benchrunner-capture";
    public const int Version = 1;

    public const string StartedKey = "started";
    public const string ConnectionKey = "connection";
    public const string InstrumentKey = "instrument";
    public const string NoteKey = "note";

    public const string StartedFormat = "yyyy-MM-dd'T'HH:mm:ss.ffffff'Z'";

    /// <summary>Integer digits the writer pads offsets to, so that lines of a session line up.</summary>
    public const int OffsetPadDigits = 5;

    /// <summary>At most this many integer digits of seconds (over 300 years), so parsing cannot overflow.</summary>
    public const int OffsetMaxDigits = 10;

    public const int OffsetFractionDigits = 6;

    /// <summary>The first offset that no longer fits <see cref="OffsetMaxDigits"/> digits of seconds.</summary>
    public static readonly TimeSpan OffsetLimit = TimeSpan.FromSeconds(1e10);

    public static readonly string[] Markers = [">", "<", ">b", "<b", "!"];

    public static string Marker(CaptureDirection direction, bool base64) => (direction, base64) switch
    {
        (CaptureDirection.HostToDevice, false) => ">",
        (CaptureDirection.DeviceToHost, false) => "<",
        (CaptureDirection.HostToDevice, true) => ">b",
        _ => "<b",
    };

    public static string FormatStarted(DateTimeOffset startedUtc) =>
        startedUtc.ToUniversalTime().ToString(StartedFormat, CultureInfo.InvariantCulture);

    /// <summary>Whole microseconds in <paramref name="offset"/>; finer parts are dropped.</summary>
    public static long Microseconds(TimeSpan offset) => offset.Ticks / (TimeSpan.TicksPerMillisecond / 1000);

    public static TimeSpan FromMicroseconds(long microseconds) =>
        TimeSpan.FromTicks(microseconds * (TimeSpan.TicksPerMillisecond / 1000));

    /// <summary>Seconds with six decimals, integer part zero-padded: <c>00012.000345</c>.</summary>
    public static string FormatOffset(TimeSpan offset)
    {
        long micros = Microseconds(offset);
        var seconds = (micros / 1_000_000).ToString(CultureInfo.InvariantCulture).PadLeft(OffsetPadDigits, '0');
        var fraction = (micros % 1_000_000).ToString(CultureInfo.InvariantCulture).PadLeft(OffsetFractionDigits, '0');
        return $"{seconds}.{fraction}";
    }

    /// <summary>Shows an offset for messages: <c>12.000345 s</c>.</summary>
    public static string DescribeOffset(TimeSpan offset)
    {
        long micros = Microseconds(offset);
        return string.Create(CultureInfo.InvariantCulture, $"{micros / 1_000_000}.{micros % 1_000_000:D6} s");
    }

    /// <summary>Whether <paramref name="key"/> is a well-formed header key: a lower-case letter, then lower-case letters, digits or '-'.</summary>
    public static bool IsValidKey(string key)
    {
        if (key.Length == 0 || key[0] is < 'a' or > 'z')
        {
            return false;
        }

        foreach (var c in key)
        {
            if (c is not ((>= 'a' and <= 'z') or (>= '0' and <= '9') or '-'))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>Text for a header value or an event: its UTF-8 bytes, escaped.</summary>
    public static string EscapeText(string text) => CaptureEscaping.Escape(Encoding.UTF8.GetBytes(text));
}
