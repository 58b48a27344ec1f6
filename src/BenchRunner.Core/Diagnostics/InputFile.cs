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
    public static string ReadAllText(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        try
        {
            return File.ReadAllText(path);
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
