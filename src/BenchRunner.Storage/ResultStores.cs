using BenchRunner.Storage.Sqlite;

namespace BenchRunner.Storage;

/// <summary>
/// Opens a result store from its location: the one place a store backend is chosen. A location is
/// a file path (the embedded SQLite store, created when missing).
/// </summary>
public static class ResultStores
{
    /// <summary>Opens (or creates) the store at <paramref name="location"/>.</summary>
    /// <param name="location">A result file's path.</param>
    /// <param name="time">The clock for timestamps; the system clock by default.</param>
    /// <exception cref="ResultStoreException">Not a result store, a newer schema, an unknown kind of location, or it cannot be opened.</exception>
    public static IResultStore Open(string location, TimeProvider? time = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(location);
        if (IsServerAddress(location))
        {
            throw new ResultStoreException($"{RedactedAddress(location)}: a database server cannot be used as a result store yet; give a file path.");
        }

        return SqliteResultStore.Open(location, time);
    }

    private static bool IsServerAddress(string location) =>
        location.Contains("://", StringComparison.Ordinal);

    /// <summary>The address without anything between "://" and "@" (user and password never reach a message).</summary>
    private static string RedactedAddress(string location)
    {
        int scheme = location.IndexOf("://", StringComparison.Ordinal);
        int at = location.IndexOf('@', scheme + 3);
        return at < 0 ? location : string.Concat(location.AsSpan(0, scheme + 3), "…", location.AsSpan(at));
    }
}
