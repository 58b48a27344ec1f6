namespace BenchRunner.Storage;

/// <summary>A result store opened from a location: it reads and writes, and is closed when disposed.</summary>
public interface IResultStore : IResultWriter, IResultReader, IDisposable, IAsyncDisposable
{
    /// <summary>Where the store is, for people (a file's full path, a server's address without credentials).</summary>
    string Location { get; }

    /// <summary>The runs found still running when the store was opened and marked interrupted, oldest first.</summary>
    IReadOnlyList<long> InterruptedAtOpen { get; }
}
