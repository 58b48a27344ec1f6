using BenchRunner.Core.Traces;
using BenchRunner.Storage.Columns;
using Microsoft.Data.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Sqlite;

public sealed partial class SqliteResultStore
{
    /// <summary>Records the start of a run, with status running and the start time from the clock.</summary>
    /// <returns>The new run's id.</returns>
    /// <exception cref="ArgumentException">A required field is empty, optional text is blank, or the extra JSON is not valid.</exception>
    /// <exception cref="ResultStoreException">The file refused the write (busy beyond <see cref="BusyTimeout"/>, full, damaged).</exception>
    public long StartRun(RunRecord run)
    {
        ArgumentNullException.ThrowIfNull(run);
        Validate.Required(run.PlanName, nameof(run.PlanName));
        ArgumentNullException.ThrowIfNull(run.PlanText);
        Validate.Required(run.SoftwareVersion, nameof(run.SoftwareVersion));
        Validate.Required(run.Host, nameof(run.Host));
        Validate.OptionalText(run.BenchName, nameof(run.BenchName));
        Validate.OptionalText(run.Operator, nameof(run.Operator));
        Validate.OptionalText(run.DutSerial, nameof(run.DutSerial));
        Validate.OptionalText(run.Lot, nameof(run.Lot));
        Validate.Json(run.ExtraJson, nameof(run.ExtraJson));
        var mode = ColumnText.From(run.Mode);
        var sha = PlanHash.Sha256Hex(run.PlanText);

        return Write(transaction =>
        {
            using var command = Command(transaction, """
                INSERT INTO runs (mode, plan_name, plan_text, plan_sha256, bench_name, bench_text, status, operator,
                                  dut_serial, lot, is_retest, software_version, host, started_utc, notes, extra_json)
                VALUES ($mode, $plan_name, $plan_text, $plan_sha256, $bench_name, $bench_text, 'running', $operator,
                        $dut_serial, $lot, $is_retest, $software_version, $host, $started_utc, $notes, $extra_json)
                RETURNING id
                """);
            command.With("$mode", mode).With("$plan_name", run.PlanName).With("$plan_text", run.PlanText)
                .With("$plan_sha256", sha).With("$bench_name", run.BenchName).With("$bench_text", run.BenchText)
                .With("$operator", run.Operator).With("$dut_serial", run.DutSerial).With("$lot", run.Lot)
                .With("$is_retest", run.IsRetest ? 1 : 0).With("$software_version", run.SoftwareVersion)
                .With("$host", run.Host).With("$started_utc", UtcText.From(_time.GetUtcNow()))
                .With("$notes", run.Notes).With("$extra_json", run.ExtraJson);
            return (long)command.ExecuteScalar()!;
        });
    }

    /// <summary>Records an instrument a running run uses.</summary>
    /// <returns>The instrument row's id.</returns>
    /// <exception cref="ArgumentException">No such run, a field is empty, the role is taken in this run, or the compensation is not valid JSON.</exception>
    /// <exception cref="InvalidOperationException">The run has finished.</exception>
    /// <exception cref="ResultStoreException">The file refused the write (busy beyond <see cref="BusyTimeout"/>, full, damaged).</exception>
    public long AddInstrument(long runId, InstrumentRecord instrument)
    {
        ArgumentNullException.ThrowIfNull(instrument);
        Validate.Required(instrument.Role, nameof(instrument.Role));
        Validate.Required(instrument.Kind, nameof(instrument.Kind));
        ArgumentNullException.ThrowIfNull(instrument.Maker);
        ArgumentNullException.ThrowIfNull(instrument.Model);
        ArgumentNullException.ThrowIfNull(instrument.Serial);
        ArgumentNullException.ThrowIfNull(instrument.Firmware);
        Validate.OptionalText(instrument.Connection, nameof(instrument.Connection));
        Validate.Json(instrument.CompensationJson, nameof(instrument.CompensationJson));

        return Write(transaction =>
        {
            RequireRunning(transaction, runId);
            using (var taken = Command(transaction, "SELECT 1 FROM instruments WHERE run_id = $run AND role = $role"))
            {
                if (taken.With("$run", runId).With("$role", instrument.Role).ExecuteScalar() is not null)
                {
                    throw new ArgumentException($"Run {runId} already has an instrument in role \"{instrument.Role}\".", nameof(instrument));
                }
            }

            using var command = Command(transaction, """
                INSERT INTO instruments (run_id, role, kind, maker, model, serial, firmware, connection, compensation_json)
                VALUES ($run, $role, $kind, $maker, $model, $serial, $firmware, $connection, $compensation)
                RETURNING id
                """);
            command.With("$run", runId).With("$role", instrument.Role).With("$kind", instrument.Kind)
                .With("$maker", instrument.Maker).With("$model", instrument.Model).With("$serial", instrument.Serial)
                .With("$firmware", instrument.Firmware).With("$connection", instrument.Connection)
                .With("$compensation", instrument.CompensationJson);
            return (long)command.ExecuteScalar()!;
        });
    }

    /// <summary>
    /// Stores a sweep of a running run, with its figures, in one transaction committed before
    /// returning. The sweep gets the run's next sequence number (1, 2, 3...).
    /// </summary>
    /// <returns>The sweep's id.</returns>
    /// <exception cref="ArgumentException">No such run, an empty step name, undefined flags, settings that are not valid JSON, or a figure key given twice (a figure is valid by construction).</exception>
    /// <exception cref="InvalidOperationException">The run has finished.</exception>
    /// <exception cref="ResultStoreException">The file refused the write (busy beyond <see cref="BusyTimeout"/>, full, damaged).</exception>
    public long AddSweep(long runId, SweepRecord sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        Validate.Required(sweep.StepName, nameof(sweep.StepName));
        ArgumentNullException.ThrowIfNull(sweep.Trace);
        Validate.OptionalText(sweep.InstrumentRole, nameof(sweep.InstrumentRole));
        Validate.OptionalText(sweep.TraceName, nameof(sweep.TraceName));
        Validate.Json(sweep.SettingsJson, nameof(sweep.SettingsJson));
        Validate.OptionalText(sweep.Compensation, nameof(sweep.Compensation));
        ValidateFigures(sweep);
        if ((sweep.Flags & ~(SweepFlags.Overloaded | SweepFlags.Uncalibrated | SweepFlags.Unlevelled)) != 0)
        {
            throw new ArgumentException($"Undefined sweep flags: {(int)sweep.Flags}.", nameof(sweep));
        }

        var trace = sweep.Trace;
        var axis = AxisColumns.From(trace.Axis);
        var samples = trace is ComplexTrace complex ? SampleBlob.FromComplex(complex.Samples) : SampleBlob.FromReal(trace.LevelsDb);

        return Write(transaction =>
        {
            RequireRunning(transaction, runId);
            using var command = Command(transaction, """
                INSERT INTO sweeps (run_id, seq, step_name, instrument_role, trace_name, quantity, unit, point_count,
                                    axis_kind, start_hz, stop_hz, axis_hz, samples, settings_json, acquired_utc, flags,
                                    compensation)
                VALUES ($run, (SELECT coalesce(max(seq), 0) + 1 FROM sweeps WHERE run_id = $run), $step, $role, $trace,
                        $quantity, $unit, $points, $axis_kind, $start_hz, $stop_hz, $axis_hz, $samples, $settings,
                        $acquired_utc, $flags, $compensation)
                RETURNING id
                """);
            command.With("$run", runId).With("$step", sweep.StepName).With("$role", sweep.InstrumentRole)
                .With("$trace", sweep.TraceName).With("$quantity", ColumnText.From(trace.Quantity))
                .With("$unit", trace.UnitSymbol).With("$points", trace.Count).With("$axis_kind", axis.Kind)
                .With("$start_hz", axis.StartHz).With("$stop_hz", axis.StopHz).With("$axis_hz", axis.PointsBlob)
                .With("$samples", samples).With("$settings", sweep.SettingsJson)
                .With("$acquired_utc", UtcText.From(sweep.AcquiredUtc ?? _time.GetUtcNow()))
                .With("$flags", (int)sweep.Flags).With("$compensation", sweep.Compensation);
            var sweepId = (long)command.ExecuteScalar()!;
            InsertFigures(transaction, runId, sweepId, sweep);
            return sweepId;
        });
    }

    /// <summary>Records the outcome of a check of a running run.</summary>
    /// <returns>The check's id.</returns>
    /// <exception cref="ArgumentException">No such run, an empty name, a number that is not finite, undefined flags, detail that is not valid JSON, or a sweep that is not part of the run.</exception>
    /// <exception cref="InvalidOperationException">The run has finished.</exception>
    /// <exception cref="ResultStoreException">The file refused the write (busy beyond <see cref="BusyTimeout"/>, full, damaged).</exception>
    public long AddCheck(long runId, CheckRecord check)
    {
        ArgumentNullException.ThrowIfNull(check);
        Validate.Required(check.Name, nameof(check.Name));
        Validate.Finite(check.Measured, nameof(check.Measured));
        Validate.Finite(check.Margin, nameof(check.Margin));
        Validate.Json(check.DetailJson, nameof(check.DetailJson));
        if ((check.Flags & ~CheckFlags.TraceOverloaded) != 0)
        {
            throw new ArgumentException($"Undefined check flags: {(int)check.Flags}.", nameof(check));
        }

        var kind = ColumnText.From(check.Kind);

        return Write(transaction =>
        {
            RequireRunning(transaction, runId);
            if (check.SweepId is { } sweepId)
            {
                using var owner = Command(transaction, "SELECT 1 FROM sweeps WHERE id = $sweep AND run_id = $run");
                if (owner.With("$sweep", sweepId).With("$run", runId).ExecuteScalar() is null)
                {
                    throw new ArgumentException($"Sweep {sweepId} is not part of run {runId}.", nameof(check));
                }
            }

            using var command = Command(transaction, """
                INSERT INTO checks (run_id, sweep_id, name, kind, passed, measured, measured_unit, limit_text, margin,
                                    margin_unit, worst_hz, message, flags, detail_json)
                VALUES ($run, $sweep, $name, $kind, $passed, $measured, $measured_unit, $limit_text, $margin,
                        $margin_unit, $worst_hz, $message, $flags, $detail_json)
                RETURNING id
                """);
            command.With("$run", runId).With("$sweep", check.SweepId).With("$name", check.Name).With("$kind", kind)
                .With("$passed", check.Passed ? 1 : 0).With("$measured", check.Measured)
                .With("$measured_unit", check.MeasuredUnit).With("$limit_text", check.LimitText)
                .With("$margin", check.Margin).With("$margin_unit", check.MarginUnit)
                .With("$worst_hz", check.WorstFrequency?.Hertz).With("$message", check.Message)
                .With("$flags", (int)check.Flags).With("$detail_json", check.DetailJson);
            return (long)command.ExecuteScalar()!;
        });
    }

    /// <summary>Records the end of a running run: its final status, the end time from the clock, and an error message if any.</summary>
    /// <exception cref="ArgumentException">No such run, or <paramref name="status"/> is <see cref="RunStatus.Running"/>.</exception>
    /// <exception cref="InvalidOperationException">The run has already finished.</exception>
    /// <exception cref="ResultStoreException">The file refused the write (busy beyond <see cref="BusyTimeout"/>, full, damaged).</exception>
    public void FinishRun(long runId, RunStatus status, string? errorMessage = null)
    {
        if (status == RunStatus.Running)
        {
            throw new ArgumentException("A run finishes with a final status, not running.", nameof(status));
        }

        var text = ColumnText.From(status);
        Write(transaction =>
        {
            RequireRunning(transaction, runId);
            using var command = Command(transaction,
                "UPDATE runs SET status = $status, ended_utc = $ended, error_message = $error WHERE id = $run");
            command.With("$status", text).With("$ended", UtcText.From(_time.GetUtcNow()))
                .With("$error", errorMessage).With("$run", runId);
            return command.ExecuteNonQuery();
        });
    }

    private static void ValidateFigures(SweepRecord sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep.Figures);
        var keys = new HashSet<string>(StringComparer.Ordinal);
        foreach (var figure in sweep.Figures)
        {
            // A NamedFigure is valid by construction (a value in its key's unit, or a reason); only
            // a repeated key is left to refuse.
            ArgumentNullException.ThrowIfNull(figure, nameof(sweep.Figures));
            if (!keys.Add(figure.Key.Word))
            {
                throw new ArgumentException($"Figure {figure.Key.Word} is given twice.", nameof(sweep));
            }
        }
    }

    private void InsertFigures(SqliteTransaction transaction, long runId, long sweepId, SweepRecord sweep)
    {
        if (sweep.Figures.Count == 0)
        {
            return;
        }

        using var command = Command(transaction, """
            INSERT INTO figures (run_id, sweep_id, key, label, value, unit, reason)
            VALUES ($run, $sweep, $key, $label, $value, $unit, $reason)
            """);
        command.With("$run", runId).With("$sweep", sweepId);
        var key = command.Parameters.Add("$key", SqliteType.Text);
        var label = command.Parameters.Add("$label", SqliteType.Text);
        var value = command.Parameters.Add("$value", SqliteType.Real);
        var unit = command.Parameters.Add("$unit", SqliteType.Text);
        var reason = command.Parameters.Add("$reason", SqliteType.Text);
        foreach (var figure in sweep.Figures)
        {
            var columns = FigureColumns.From(figure);
            key.Value = columns.Key;
            label.Value = columns.Label;
            value.Value = columns.Value is { } v ? v : DBNull.Value;
            unit.Value = columns.Unit;
            reason.Value = (object?)columns.Reason ?? DBNull.Value;
            command.ExecuteNonQuery();
        }
    }

    private void RequireRunning(SqliteTransaction transaction, long runId)
    {
        using var command = Command(transaction, "SELECT status FROM runs WHERE id = $run");
        var status = command.With("$run", runId).ExecuteScalar() as string;
        if (status is null)
        {
            throw new ArgumentException($"There is no run {runId} in {Path}.", nameof(runId));
        }

        if (status != "running")
        {
            throw new InvalidOperationException($"Run {runId} has already finished ({status}); nothing more can be added to it.");
        }
    }

    private T Write<T>(Func<SqliteTransaction, T> work)
    {
        lock (_gate)
        {
            ThrowIfDisposed();
            try
            {
                using var transaction = _connection.BeginTransaction();
                var result = work(transaction);
                transaction.Commit();
                return result;
            }
            catch (SqliteException e)
            {
                throw new ResultStoreException($"{Path}: the write failed: {e.Message}", e);
            }
        }
    }
}
