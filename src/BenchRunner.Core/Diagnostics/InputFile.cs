namespace BenchRunner.Core.Diagnostics;

/// <summary>
/// Reads a user's input file, turning "not there" and "not allowed" into an
/// <see cref="InputFormatException"/> naming the file, so that a mistyped path is reported as
/// bad input in one line rather than as an I/O failure.
/// </summary>
public static class InputFile
{
    /// <summary>The whole text of <paramref name="path"/>.</summary>
    /// <exception cref="InputFormatException">The file is missing, is a folder, or cannot be read.</exception>
    public static string ReadAllText(string path) => Guard(path, () => File.ReadAllText(path));

    /// <summary>Opens <paramref name="path"/> for reading as text in <paramref name="encoding"/> (no byte-order-mark detection).</summary>
    /// <exception cref="InputFormatException">The file is missing, is a folder, or cannot be read.</exception>
    public static StreamReader OpenText(string path, System.Text.Encoding encoding) =>
        Guard(path, () => new StreamReader(path, encoding, detectEncodingFromByteOrderMarks: false));

    private static T Guard<T>(string path, Func<T> open)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        try
        {
            return open();
        }
        catch (Exception ex) when (ex is FileNotFoundException or DirectoryNotFoundException)
        {
            throw new InputFormatException(SourceLocation.OfFile(path), "no such file", ex);
        }
        catch (UnauthorizedAccessException ex)
        {
            throw new InputFormatException(SourceLocation.OfFile(path),
                Directory.Exists(path) ? "is a folder, not a file" : "cannot be read: permission denied", ex);
        }
        catch (IOException ex)
        {
            throw new InputFormatException(SourceLocation.OfFile(path), $"cannot be read: {ex.Message}", ex);
        }
    }
}
