using BenchRunner.Core.Runs;
namespace BenchRunner.Storage.Sqlite;

/// <summary>
/// The store's asynchronous face. SQLite in this process is synchronous underneath (each write is a
/// short local transaction), so each call does its work at once and returns a completed task; a
/// cancelled token is honoured before the work starts.
/// </summary>
public sealed partial class SqliteResultStore
{
    /// <inheritdoc/>
    public string Location => Path;

    /// <inheritdoc/>
    public Task<long> StartRunAsync(RunRecord run, CancellationToken cancellationToken = default) =>
        Do(() => StartRun(run), cancellationToken);

    /// <inheritdoc/>
    public Task<long> AddInstrumentAsync(long runId, InstrumentRecord instrument, CancellationToken cancellationToken = default) =>
        Do(() => AddInstrument(runId, instrument), cancellationToken);

    /// <inheritdoc/>
    public Task<long> AddSweepAsync(long runId, SweepRecord sweep, CancellationToken cancellationToken = default) =>
        Do(() => AddSweep(runId, sweep), cancellationToken);

    /// <inheritdoc/>
    public Task<long> AddCheckAsync(long runId, CheckRecord check, CancellationToken cancellationToken = default) =>
        Do(() => AddCheck(runId, check), cancellationToken);

    /// <inheritdoc/>
    public Task FinishRunAsync(long runId, RunStatus status, string? errorMessage = null, CancellationToken cancellationToken = default) =>
        Do(() => { FinishRun(runId, status, errorMessage); return true; }, cancellationToken);

    /// <inheritdoc/>
    public Task<StoredRun?> GetRunAsync(long runId, CancellationToken cancellationToken = default) =>
        Do(() => GetRun(runId), cancellationToken);

    /// <inheritdoc/>
    public Task<IReadOnlyList<StoredRun>> ListRunsAsync(RunFilter? filter = null, CancellationToken cancellationToken = default) =>
        Do(() => ListRuns(filter), cancellationToken);

    /// <inheritdoc/>
    public Task<IReadOnlyList<InstrumentRecord>> GetInstrumentsAsync(long runId, CancellationToken cancellationToken = default) =>
        Do(() => GetInstruments(runId), cancellationToken);

    /// <inheritdoc/>
    public Task<IReadOnlyList<StoredSweep>> GetSweepsAsync(long runId, CancellationToken cancellationToken = default) =>
        Do(() => GetSweeps(runId), cancellationToken);

    /// <inheritdoc/>
    public Task<IReadOnlyList<StoredFigure>> GetFiguresAsync(long runId, CancellationToken cancellationToken = default) =>
        Do(() => GetFigures(runId), cancellationToken);

    /// <inheritdoc/>
    public Task<IReadOnlyList<StoredCheck>> GetChecksAsync(long runId, CancellationToken cancellationToken = default) =>
        Do(() => GetChecks(runId), cancellationToken);

    /// <inheritdoc/>
    public Task<IReadOnlyList<SerialVerdict>> LatestVerdictPerSerialAsync(string? lot = null, CancellationToken cancellationToken = default) =>
        Do(() => LatestVerdictPerSerial(lot), cancellationToken);

    private static Task<T> Do<T>(Func<T> work, CancellationToken cancellationToken)
    {
        if (cancellationToken.IsCancellationRequested)
        {
            return Task.FromCanceled<T>(cancellationToken);
        }

        try
        {
            return Task.FromResult(work());
        }
        catch (Exception e)
        {
            return Task.FromException<T>(e);
        }
    }
}
