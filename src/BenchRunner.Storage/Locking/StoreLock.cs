using System.Diagnostics;

namespace BenchRunner.Storage.Locking;

/// <summary>
/// Tells whether any other store has a result file open, through an operating-system lock on a
/// companion file (<c>results.db</c> gives <c>results.db-lock</c>). Every open store holds a
/// shared lock until it is disposed; the operating system drops the lock of a process that dies.
/// Taking the lock exclusively therefore succeeds only when no other store is open, which is the
/// one moment a run still marked running can safely be called interrupted.
/// </summary>
internal sealed class StoreLock : IDisposable
{
    private static readonly TimeSpan RetryDelay = TimeSpan.FromMilliseconds(20);

    private readonly string _lockPath;
    private FileStream? _exclusive;
    private FileStream? _shared;

    private StoreLock(string lockPath) => _lockPath = lockPath;

    /// <summary>The path of the lock file.</summary>
    public string LockPath => _lockPath;

    /// <summary>
    /// Takes the lock for <paramref name="databasePath"/>: exclusively if no other store has the
    /// file open (then <see cref="IsSole"/> is true until <see cref="Share"/>), else shared.
    /// </summary>
    /// <exception cref="IOException">The lock file cannot be created or the lock not taken within <paramref name="timeout"/>.</exception>
    public static StoreLock Take(string databasePath, TimeSpan timeout)
    {
        var storeLock = new StoreLock(databasePath + "-lock");
        storeLock._exclusive = TryOpen(storeLock._lockPath, FileShare.None);
        if (storeLock._exclusive is null)
        {
            storeLock._shared = OpenShared(storeLock._lockPath, timeout);
        }

        return storeLock;
    }

    /// <summary>True while this is the only store with the file open.</summary>
    public bool IsSole => _exclusive is not null;

    /// <summary>Lets other stores open the file: turns an exclusive lock into a shared one.</summary>
    /// <exception cref="IOException">The shared lock could not be taken within <paramref name="timeout"/>.</exception>
    public void Share(TimeSpan timeout)
    {
        if (_exclusive is null)
        {
            return;
        }

        // The release and the re-take are two steps; a store that takes the lock exclusively
        // in between finds no open store, which is true: this one has not started any run yet.
        _exclusive.Dispose();
        _exclusive = null;
        _shared = OpenShared(_lockPath, timeout);
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        _exclusive?.Dispose();
        _shared?.Dispose();
        _exclusive = null;
        _shared = null;
    }

    private static FileStream OpenShared(string path, TimeSpan timeout)
    {
        // Another store holds the lock exclusively only while it opens, so waiting is short.
        // Real elapsed time, not the store's clock: this waits on another process.
        var waited = Stopwatch.StartNew();
        while (true)
        {
            if (TryOpen(path, FileShare.ReadWrite | FileShare.Delete) is { } stream)
            {
                return stream;
            }

            if (waited.Elapsed > timeout)
            {
                throw new IOException($"{path}: another process kept the result file's lock for longer than {timeout.TotalSeconds:0.#} s.");
            }

            Thread.Sleep(RetryDelay);
        }
    }

    private static FileStream? TryOpen(string path, FileShare share)
    {
        try
        {
            return new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, share);
        }
        catch (IOException) when (File.Exists(path))
        {
            return null;
        }
    }
}
