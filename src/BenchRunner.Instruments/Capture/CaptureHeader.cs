namespace BenchRunner.Instruments.Capture;

/// <summary>
/// The header of a capture: when the recording started (UTC), what connection it was made on,
/// the bench name of the instrument and a free note, plus any further <c>key: value</c> lines
/// (kept, in order, so that a newer writer's additions survive a round trip).
/// </summary>
public sealed class CaptureHeader
{
    private static readonly string[] KnownKeys =
        [CaptureFormat.StartedKey, CaptureFormat.ConnectionKey, CaptureFormat.InstrumentKey, CaptureFormat.NoteKey];

    /// <summary>Creates a header.</summary>
    /// <param name="startedUtc">When the recording started; converted to UTC and kept to whole microseconds.</param>
    /// <param name="connection">The connection description (e.g. a transport's description); not empty.</param>
    /// <param name="instrument">The bench name of the instrument, or null.</param>
    /// <param name="note">A free note (board serial, purpose), or null.</param>
    /// <param name="extra">Further header entries; keys are lower-case letters, digits and '-', starting with a letter, unique, and none of the named keys.</param>
    /// <exception cref="ArgumentException">An empty connection, an empty instrument name, or a bad or repeated extra key.</exception>
    public CaptureHeader(
        DateTimeOffset startedUtc,
        string connection,
        string? instrument = null,
        string? note = null,
        IEnumerable<KeyValuePair<string, string>>? extra = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(connection);
        if (instrument is { Length: 0 })
        {
            throw new ArgumentException("The instrument name must not be empty (use null for none).", nameof(instrument));
        }

        var utc = startedUtc.ToUniversalTime();
        StartedUtc = new DateTimeOffset(utc.Ticks - utc.Ticks % (TimeSpan.TicksPerMillisecond / 1000), TimeSpan.Zero);
        Connection = connection;
        Instrument = instrument;
        Note = note;

        var entries = new List<KeyValuePair<string, string>>();
        foreach (var entry in extra ?? [])
        {
            if (!CaptureFormat.IsValidKey(entry.Key) || KnownKeys.Contains(entry.Key) || entries.Any(e => e.Key == entry.Key))
            {
                throw new ArgumentException($"\"{entry.Key}\" cannot be an extra header key: it must be new, unique, and made of lower-case letters, digits and '-', starting with a letter.", nameof(extra));
            }

            ArgumentNullException.ThrowIfNull(entry.Value, nameof(extra));
            entries.Add(entry);
        }

        Extra = entries;
    }

    /// <summary>The format version of the file this header came from, or that the writer writes: 1.</summary>
    public int FormatVersion => CaptureFormat.Version;

    /// <summary>When the recording started, in UTC, to the microsecond. Chunk offsets count from here.</summary>
    public DateTimeOffset StartedUtc { get; }

    /// <summary>The connection the session was recorded on, e.g. <c>memory (host end)</c>, or a serial port and its speed.</summary>
    public string Connection { get; }

    /// <summary>The bench name of the instrument, e.g. <c>vna</c>; null when not given.</summary>
    public string? Instrument { get; }

    /// <summary>A free note, e.g. <c>PSF-24-0001 after alignment</c>; null when not given.</summary>
    public string? Note { get; }

    /// <summary>Header entries other than the named ones, in file order.</summary>
    public IReadOnlyList<KeyValuePair<string, string>> Extra { get; }
}
