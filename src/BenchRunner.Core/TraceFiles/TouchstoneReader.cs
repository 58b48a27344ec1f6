using System.Globalization;
using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.TraceFiles;

/// <summary>
/// Reads Touchstone files (IBIS Open Forum, Touchstone File Format Specification 1.1 and 2.0).
/// </summary>
/// <remarks>
/// <para>Accepted: <c>!</c> comments; the option line <c># [Hz|kHz|MHz|GHz] [S|Y|Z] [DB|MA|RI] [R n]</c>
/// (case-insensitive, any field may be omitted: defaults GHz, S, MA, R 50; only the first option
/// line counts); version 1 data with the 2-port order N11 N21 N12 N22; version 2.0 keywords
/// <c>[Version]</c>, <c>[Number of Ports]</c>, <c>[Two-Port Data Order]</c>,
/// <c>[Number of Frequencies]</c>, <c>[Number of Noise Frequencies]</c>, <c>[Reference]</c>,
/// <c>[Matrix Format]</c>, <c>[Begin Information]</c>/<c>[End Information]</c> (skipped),
/// <c>[Network Data]</c>, <c>[Noise Data]</c> (skipped) and <c>[End]</c>. Data of one
/// frequency may wrap over several lines, with line breaks between complex pairs; frequencies
/// must be strictly increasing. Y and Z data are converted to S-parameters with the reference
/// resistances (version 1 Y and Z values are normalised to R, version 2 values are not).</para>
/// <para>Refused with an <see cref="InputFormatException"/>: H and G parameters, mixed-mode data,
/// and every malformed line, with file, line and (where it helps) column.</para>
/// </remarks>
public static class TouchstoneReader
{
    /// <summary>
    /// Reads a Touchstone file. For version 1 files the port count comes from the extension
    /// (<c>.s1p</c>, <c>.s2p</c>, ... <c>.sNp</c>); a <c>.ts</c> file must be version 2.0.
    /// The path as given is the file name in error messages.
    /// </summary>
    /// <exception cref="InputFormatException">The file is missing, unreadable or malformed.</exception>
    public static TouchstoneData Read(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        using var reader = TraceFileAccess.OpenText(path);
        var extension = Path.GetExtension(path);
        return new TouchstoneParser(path, PortsFromExtension(extension), extension.Equals(".ts", StringComparison.OrdinalIgnoreCase))
            .Parse(reader);
    }

    /// <summary>Parses Touchstone text.</summary>
    /// <param name="reader">The text.</param>
    /// <param name="sourceName">The file name to put in error messages.</param>
    /// <param name="portsFromExtension">
    /// The port count named by the file's extension, or null. Version 1 files need it unless their
    /// first data line shows 1 port (3 values) or 2 ports (9 values); in version 2 files it must
    /// agree with <c>[Number of Ports]</c>.
    /// </param>
    /// <exception cref="InputFormatException">The text is malformed.</exception>
    public static TouchstoneData Parse(TextReader reader, string sourceName, int? portsFromExtension)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(sourceName);
        if (portsFromExtension is < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(portsFromExtension), portsFromExtension, "A port count must be at least 1.");
        }

        return new TouchstoneParser(sourceName, portsFromExtension, requireVersion2: false).Parse(reader);
    }

    /// <summary>N for an extension <c>.sNp</c> (any letter case), otherwise null.</summary>
    internal static int? PortsFromExtension(string extension)
    {
        if (extension.Length >= 4
            && extension[0] == '.'
            && char.ToLowerInvariant(extension[1]) == 's'
            && char.ToLowerInvariant(extension[^1]) == 'p'
            && int.TryParse(extension.AsSpan(2, extension.Length - 3), NumberStyles.None, CultureInfo.InvariantCulture, out var ports)
            && ports >= 1)
        {
            return ports;
        }

        return null;
    }
}
