using BenchRunner.Core.Runs;
namespace BenchRunner.Storage;

/// <summary>
/// Where runs are written: a run, the instruments it used, every sweep, every check, and how it
/// ended. Each call is durable when its task completes (a crash afterwards loses nothing it
/// acknowledged). A backend implements this without knowing anything of plans, runners or views;
/// the run recorder is its usual caller.
/// </summary>
public interface IResultWriter
{
    /// <summary>Records a new run as running and returns its id in this store.</summary>
    /// <exception cref="ResultStoreException">The store refused or failed the write.</exception>
    Task<long> StartRunAsync(RunRecord run, CancellationToken cancellationToken = default);

    /// <summary>Records an instrument the run used, with its identity; returns the row's id.</summary>
    Task<long> AddInstrumentAsync(long runId, InstrumentRecord instrument, CancellationToken cancellationToken = default);

    /// <summary>Records one sweep (exact samples, settings, figures) of the run; returns the sweep's id.</summary>
    Task<long> AddSweepAsync(long runId, SweepRecord sweep, CancellationToken cancellationToken = default);

    /// <summary>Records one check of the run; returns the check's id.</summary>
    Task<long> AddCheckAsync(long runId, CheckRecord check, CancellationToken cancellationToken = default);

    /// <summary>Records how the run ended.</summary>
    Task FinishRunAsync(long runId, RunStatus status, string? errorMessage = null, CancellationToken cancellationToken = default);
}
