using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.TraceFiles;

/// <summary>Opens trace files, turning a missing or unreadable file into an <see cref="InputFormatException"/>.</summary>
internal static class TraceFileAccess
{
    /// <summary>Opens <paramref name="path"/> for reading as text (UTF-8, or the encoding its byte order mark names).</summary>
    /// <exception cref="InputFormatException">The file does not exist or cannot be read.</exception>
    public static StreamReader OpenText(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var location = SourceLocation.OfFile(path);
        try
        {
            return new StreamReader(path, detectEncodingFromByteOrderMarks: true);
        }
        catch (Exception ex) when (ex is FileNotFoundException or DirectoryNotFoundException)
        {
            throw new InputFormatException(location, "file not found", ex);
        }
        catch (UnauthorizedAccessException ex)
        {
            throw new InputFormatException(location, "cannot read the file: access denied", ex);
        }
        catch (IOException ex)
        {
            throw new InputFormatException(location, $"cannot read the file: {ex.Message}", ex);
        }
    }
}
