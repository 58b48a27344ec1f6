using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;

namespace BenchRunner.Cli.Results;

/// <summary>Opens the result database for a verb; a file that is not one (or is newer) is bad input.</summary>
public static class ResultStoreOpener
{
    /// <summary>Opens (or creates) the store at <paramref name="path"/>.</summary>
    /// <exception cref="UsageException">Not a result database, a newer schema, or a missing folder.</exception>
    public static SqliteResultStore Open(string path)
    {
        try
        {
            return SqliteResultStore.Open(path);
        }
        catch (ResultStoreException ex)
        {
            throw new UsageException(ex.Message);
        }
    }
}
