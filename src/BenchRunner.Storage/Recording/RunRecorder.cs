using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Recording;

/// <summary>
/// Turns one run's events into stored rows: the run when it starts, each instrument as it connects,
/// each sweep and check as it comes, and the end. A check is tied to the latest sweep of the trace
/// it judged. Any result writer will do; the recorder knows nothing of SQL.
/// </summary>
/// <remarks>One recorder records one run. A write that fails is passed on (the pipeline then ends the run in error).</remarks>
public sealed class RunRecorder : IRunListener
{
    private readonly IResultWriter _writer;
    private readonly TaskCompletionSource<long> _runId = new(TaskCreationOptions.RunContinuationsAsynchronously);
    private readonly Dictionary<string, long> _latestSweep = new(StringComparer.Ordinal);

    /// <summary>Creates a recorder that writes to <paramref name="writer"/>.</summary>
    public RunRecorder(IResultWriter writer) => _writer = writer ?? throw new ArgumentNullException(nameof(writer));

    /// <summary>The run's id in the store, once its start is written; faults if that write failed.</summary>
    public Task<long> RunId => _runId.Task;

    /// <summary>The run's id when its start has been written, else null.</summary>
    public long? RunIdIfKnown => _runId.Task.IsCompletedSuccessfully ? _runId.Task.Result : null;

    /// <inheritdoc/>
    public async ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
    {
        switch (runEvent)
        {
            case RunStarted started:
                await StartAsync(started.Run, cancellationToken).ConfigureAwait(false);
                break;
            case InstrumentConnected instrument:
                await _writer.AddInstrumentAsync(Id(), new InstrumentRecord(instrument.Role, instrument.Kind, instrument.Maker, instrument.Model, instrument.Serial, instrument.Firmware)
                {
                    Connection = instrument.Connection,
                    CompensationJson = instrument.CompensationJson,
                }, cancellationToken).ConfigureAwait(false);
                break;
            case SweepAcquired sweep:
                _latestSweep[sweep.TraceName] = await _writer.AddSweepAsync(Id(), new SweepRecord(sweep.Step, sweep.Trace)
                {
                    InstrumentRole = sweep.Role,
                    TraceName = sweep.TraceName,
                    Figures = sweep.Figures,
                    AcquiredUtc = sweep.At,
                    Flags = sweep.Flags,
                    Compensation = sweep.Compensation,
                    SettingsJson = sweep.SettingsJson,
                }, cancellationToken).ConfigureAwait(false);
                break;
            case CheckCompleted { Result: var check }:
                await _writer.AddCheckAsync(Id(), new CheckRecord(check.Name, check.Kind, check.Passed)
                {
                    SweepId = check.Trace is { } trace && _latestSweep.TryGetValue(trace, out var sweepId) ? sweepId : null,
                    Margin = check.Margin,
                    MarginUnit = check.MarginUnit,
                    WorstFrequency = check.WorstAt,
                    Message = check.Detail,
                    Flags = check.TraceOverloaded ? CheckFlags.TraceOverloaded : CheckFlags.None,
                    DetailJson = check.DetailJson,
                }, cancellationToken).ConfigureAwait(false);
                break;
            case RunEnded ended:
                await _writer.FinishRunAsync(Id(), ended.Status, ended.Error, cancellationToken).ConfigureAwait(false);
                break;
        }
    }

    private async Task StartAsync(RunHeader run, CancellationToken cancellationToken)
    {
        try
        {
            _runId.SetResult(await _writer.StartRunAsync(new RunRecord(run.Mode, run.PlanName, run.PlanText, run.SoftwareVersion, run.Host)
            {
                BenchName = run.BenchName,
                BenchText = run.BenchText,
                Operator = run.Operator,
                DutSerial = run.DutSerial,
                Lot = run.Lot,
                IsRetest = run.IsRetest,
                ExtraJson = run.LimitsJson,
            }, cancellationToken).ConfigureAwait(false));
        }
        catch (Exception ex)
        {
            _runId.TrySetException(ex);
            throw;
        }
    }

    private long Id() => RunIdIfKnown ?? throw new InvalidOperationException("An event arrived before the run was started or after its start failed to be recorded.");
}
