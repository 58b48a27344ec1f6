namespace BenchRunner.Storage;

/// <summary>
/// Reads what was recorded: runs, their instruments, sweeps, figures and checks, and the verdict of
/// each board. Everything a report or a listing shows comes from here, exactly as it was stored;
/// nothing is judged again.
/// </summary>
public interface IResultReader
{
    /// <summary>The run with id <paramref name="runId"/>, or null when there is none.</summary>
    /// <exception cref="ResultStoreException">The row cannot be read.</exception>
    Task<StoredRun?> GetRunAsync(long runId, CancellationToken cancellationToken = default);

    /// <summary>The runs that match <paramref name="filter"/> (all by default), newest start first.</summary>
    Task<IReadOnlyList<StoredRun>> ListRunsAsync(RunFilter? filter = null, CancellationToken cancellationToken = default);

    /// <summary>The instruments of a run, in the order they were connected.</summary>
    Task<IReadOnlyList<InstrumentRecord>> GetInstrumentsAsync(long runId, CancellationToken cancellationToken = default);

    /// <summary>The sweeps of a run, in the order they were acquired.</summary>
    Task<IReadOnlyList<StoredSweep>> GetSweepsAsync(long runId, CancellationToken cancellationToken = default);

    /// <summary>Every figure of every sweep of a run, in sweep order.</summary>
    Task<IReadOnlyList<StoredFigure>> GetFiguresAsync(long runId, CancellationToken cancellationToken = default);

    /// <summary>The checks of a run, in the order they were judged.</summary>
    Task<IReadOnlyList<StoredCheck>> GetChecksAsync(long runId, CancellationToken cancellationToken = default);

    /// <summary>For each board serial (optionally of one lot), its latest passed or failed run.</summary>
    Task<IReadOnlyList<SerialVerdict>> LatestVerdictPerSerialAsync(string? lot = null, CancellationToken cancellationToken = default);
}
