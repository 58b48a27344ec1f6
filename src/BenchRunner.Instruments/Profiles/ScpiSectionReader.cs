using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// What an <see cref="InstrumentKind"/> is given to read its section of an <c>adapter: scpi</c>
/// driver profile. Every command read through <see cref="Command"/> is remembered with its place, so
/// that a problem <see cref="ScpiCommandSet.Problems"/> later finds in it is reported at that place.
/// </summary>
public sealed class ScpiSectionReader
{
    private readonly ScpiProfileReader _reader;
    private readonly StrictMap _profile;

    internal ScpiSectionReader(ScpiProfileReader reader, InstrumentKind kind, StrictMap profile, bool enabled)
    {
        _reader = reader;
        _profile = profile;
        Kind = kind;
        Enabled = enabled;
    }

    /// <summary>The kind whose section is read; its <see cref="InstrumentKind.Word"/> is the section's key.</summary>
    public InstrumentKind Kind { get; }

    /// <summary>Whether the profile lists the kind: the section read is then enabled.</summary>
    public bool Enabled { get; }

    /// <summary>Where problems are reported; the profile is refused when any is.</summary>
    public YamlProblems Problems => _profile.Problems;

    /// <summary>
    /// Opens the section as a mapping with the keys <paramref name="keys"/>; null when the profile has
    /// no such section or an empty one (every command keeps its default). A key of
    /// <paramref name="foreign"/> (a key of raw profiles) is reported with its hint.
    /// </summary>
    public StrictMap? Open(IReadOnlyList<string> keys, IReadOnlyDictionary<string, string>? foreign = null) =>
        _reader.Section(_profile, Kind.Word, keys, foreign ?? ForeignKeys.Nothing);

    /// <summary>
    /// The command under <paramref name="key"/> of <paramref name="section"/>: <paramref name="fallback"/>
    /// when absent, null when written as <c>none</c>, otherwise the text as written.
    /// </summary>
    /// <param name="section">The opened section, or null for none (the fallback is returned).</param>
    /// <param name="key">The key in the file.</param>
    /// <param name="name">The command's name in the section's problems, e.g. <c>attenuator.set</c>.</param>
    /// <param name="fallback">The default command.</param>
    public string? Command(StrictMap? section, string key, string name, string? fallback) =>
        _reader.Command(section, key, name, fallback);

    internal ScpiProfileReader Reader => _reader;
}
