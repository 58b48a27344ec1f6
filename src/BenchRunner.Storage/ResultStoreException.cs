namespace BenchRunner.Storage;

/// <summary>
/// The result file cannot be used: not a result file, written by a newer version, damaged, or
/// locked by another program for too long. The message names the file and what to do.
/// </summary>
public sealed class ResultStoreException : Exception
{
    /// <summary>Creates the exception.</summary>
    public ResultStoreException(string message, Exception? innerException = null)
        : base(message, innerException)
    {
    }
}
