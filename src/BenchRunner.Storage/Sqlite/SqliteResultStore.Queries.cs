using System.Text;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Storage.Columns;
using Microsoft.Data.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Sqlite;

public sealed partial class SqliteResultStore
{
    private const string RunColumns = """
        id, mode, plan_name, plan_text, plan_sha256, bench_name, bench_text, status, operator, dut_serial, lot,
        is_retest, software_version, host, started_utc, ended_utc, error_message, notes, extra_json
        """;

    /// <summary>The run with id <paramref name="runId"/>, or null when there is none.</summary>
    /// <exception cref="ResultStoreException">The row cannot be read (damaged or foreign values).</exception>
    public StoredRun? GetRun(long runId) =>
        Read($"SELECT {RunColumns} FROM runs WHERE id = $id", c => c.With("$id", runId), ReadRun).SingleOrDefault();

    /// <summary>The runs that match <paramref name="filter"/> (all runs by default), newest start first.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A limit that is not positive.</exception>
    /// <exception cref="ResultStoreException">A row cannot be read.</exception>
    public IReadOnlyList<StoredRun> ListRuns(RunFilter? filter = null)
    {
        filter ??= new RunFilter();
        if (filter.Limit is <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(filter), filter.Limit, "The limit must be positive.");
        }

        var sql = new StringBuilder($"SELECT {RunColumns} FROM runs WHERE 1 = 1");
        var bindings = new List<(string Name, object Value)>();
        void Condition(string clause, string name, object? value)
        {
            if (value is not null)
            {
                sql.Append(" AND ").Append(clause);
                bindings.Add((name, value));
            }
        }

        Condition("dut_serial = $serial", "$serial", filter.DutSerial);
        Condition("lot = $lot", "$lot", filter.Lot);
        Condition("status = $status", "$status", filter.Status is { } s ? ColumnText.From(s) : null);
        Condition("mode = $mode", "$mode", filter.Mode is { } m ? ColumnText.From(m) : null);
        Condition("started_utc >= $since", "$since", filter.Since is { } since ? UtcText.From(since) : null);
        sql.Append(" ORDER BY started_utc DESC, id DESC");
        if (filter.Limit is { } limit)
        {
            sql.Append(" LIMIT $limit");
            bindings.Add(("$limit", limit));
        }

        return Read(sql.ToString(), c =>
        {
            foreach (var (name, value) in bindings)
            {
                c.With(name, value);
            }
        }, ReadRun);
    }

    /// <summary>The instruments of run <paramref name="runId"/>, in the order they were added.</summary>
    public IReadOnlyList<InstrumentRecord> GetInstruments(long runId) =>
        Read("SELECT * FROM instruments WHERE run_id = $run ORDER BY id", c => c.With("$run", runId), row =>
            new InstrumentRecord(row.Text("role"), row.Text("kind"), row.Text("maker"), row.Text("model"), row.Text("serial"), row.Text("firmware"))
            {
                Connection = row.TextOrNull("connection"),
                CompensationJson = row.TextOrNull("compensation_json"),
            });

    /// <summary>
    /// The sweeps of run <paramref name="runId"/> in sequence order, each with its figures; the
    /// traces are rebuilt from the stored BLOBs, every double identical to the one written.
    /// </summary>
    /// <exception cref="ResultStoreException">A sweep's data is damaged.</exception>
    public IReadOnlyList<StoredSweep> GetSweeps(long runId)
    {
        var sweeps = Read("SELECT * FROM sweeps WHERE run_id = $run ORDER BY seq", c => c.With("$run", runId), ReadSweep);

        // Read after the sweeps: a sweep's figures are committed with it, so every sweep read has all of its own.
        var figures = GetFigures(runId).ToLookup(f => f.SweepId, f => f.Figure);
        return sweeps.Select(s => s with { Record = s.Record with { Figures = figures[s.Id].ToList() } }).ToList();
    }

    /// <summary>The figures of every sweep of run <paramref name="runId"/>, by sweep sequence and then in the order given.</summary>
    public IReadOnlyList<StoredFigure> GetFigures(long runId) =>
        Read("""
            SELECT f.sweep_id, s.seq, s.step_name, f.key, f.label, f.value, f.unit, f.reason
            FROM figures f JOIN sweeps s ON s.id = f.sweep_id
            WHERE f.run_id = $run
            ORDER BY s.seq, f.id
            """, c => c.With("$run", runId), row => new StoredFigure(
                row.Integer("sweep_id"),
                (int)row.Integer("seq"),
                row.Text("step_name"),
                FigureColumns.ToFigure(row.Text("key"), row.Text("label"), row.RealOrNull("value"), row.Text("unit"), row.TextOrNull("reason"))));

    /// <summary>The checks of run <paramref name="runId"/>, in the order they were added.</summary>
    public IReadOnlyList<StoredCheck> GetChecks(long runId) =>
        Read("SELECT * FROM checks WHERE run_id = $run ORDER BY id", c => c.With("$run", runId), row =>
            new StoredCheck(row.Integer("id"), row.Integer("run_id"), new CheckRecord(row.Text("name"), ColumnText.CheckKindOf(row.Text("kind")), row.Integer("passed") == 1)
            {
                SweepId = row.IntegerOrNull("sweep_id"),
                Measured = row.RealOrNull("measured"),
                MeasuredUnit = row.TextOrNull("measured_unit"),
                LimitText = row.TextOrNull("limit_text"),
                Margin = row.RealOrNull("margin"),
                MarginUnit = row.TextOrNull("margin_unit"),
                WorstFrequency = row.RealOrNull("worst_hz") is { } hz ? Frequency.FromHertz(hz) : null,
                Message = row.TextOrNull("message"),
                Flags = (CheckFlags)row.Integer("flags"),
                DetailJson = row.TextOrNull("detail_json"),
            }));

    /// <summary>
    /// Each board's verdict, the status of its latest single or batch run that ended passed or
    /// failed (the <c>latest_verdicts</c> view), by serial; a board with no such run has no entry.
    /// Only boards whose latest verdict run is in <paramref name="lot"/> when one is given.
    /// </summary>
    public IReadOnlyList<SerialVerdict> LatestVerdictPerSerial(string? lot = null) =>
        Read("SELECT * FROM latest_verdicts WHERE $lot IS NULL OR lot = $lot ORDER BY dut_serial",
            c => c.With("$lot", lot),
            row => new SerialVerdict(row.Text("dut_serial"), row.TextOrNull("lot"), row.Integer("run_id"),
                ColumnText.Status(row.Text("verdict")), row.Utc("started_utc"), (int)row.Integer("runs")));

    private static StoredRun ReadRun(SqliteDataReader row)
    {
        var record = new RunRecord(ColumnText.Mode(row.Text("mode")), row.Text("plan_name"), row.Text("plan_text"), row.Text("software_version"), row.Text("host"))
        {
            BenchName = row.TextOrNull("bench_name"),
            BenchText = row.TextOrNull("bench_text"),
            Operator = row.TextOrNull("operator"),
            DutSerial = row.TextOrNull("dut_serial"),
            Lot = row.TextOrNull("lot"),
            IsRetest = row.Integer("is_retest") == 1,
            Notes = row.TextOrNull("notes"),
            ExtraJson = row.TextOrNull("extra_json"),
        };
        return new StoredRun(row.Integer("id"), record, row.Text("plan_sha256"), ColumnText.Status(row.Text("status")),
            row.Utc("started_utc"), row.UtcOrNull("ended_utc"), row.TextOrNull("error_message"));
    }

    private static StoredSweep ReadSweep(SqliteDataReader row)
    {
        var id = row.Integer("id");
        Trace trace;
        try
        {
            trace = ReadTrace(row);
        }
        catch (FormatException e)
        {
            throw new FormatException($"sweep {id}: {e.Message}", e);
        }

        var record = new SweepRecord(row.Text("step_name"), trace)
        {
            InstrumentRole = row.TextOrNull("instrument_role"),
            TraceName = row.TextOrNull("trace_name"),
            SettingsJson = row.TextOrNull("settings_json"),
            Compensation = row.TextOrNull("compensation"),
            Flags = (SweepFlags)row.Integer("flags"),
            AcquiredUtc = row.Utc("acquired_utc"),
        };
        return new StoredSweep(id, row.Integer("run_id"), (int)row.Integer("seq"), record);
    }

    private static Trace ReadTrace(SqliteDataReader row)
    {
        var axis = new AxisColumns(row.Text("axis_kind"), row.Real("start_hz"), row.Real("stop_hz"), (int)row.Integer("point_count"), row.BlobOrNull("axis_hz")).ToAxis();
        var quantity = ColumnText.Quantity(row.Text("quantity"));
        var samples = row.BlobOrNull("samples") ?? throw new FormatException("the samples are missing");
        try
        {
            return quantity == TraceQuantity.Power
                ? new PowerTrace(axis, SampleBlob.ToReal(samples))
                : new ComplexTrace(axis, quantity, SampleBlob.ToComplex(samples));
        }
        catch (ArgumentException e)
        {
            throw new FormatException($"the samples do not fit the axis: {e.Message}", e);
        }
    }

    private List<T> Read<T>(string sql, Action<SqliteCommand> bind, Func<SqliteDataReader, T> map)
    {
        lock (_gate)
        {
            ThrowIfDisposed();
            try
            {
                using var command = Command(null, sql);
                bind(command);
                using var reader = command.ExecuteReader();
                var rows = new List<T>();
                while (reader.Read())
                {
                    rows.Add(map(reader));
                }

                return rows;
            }
            catch (Exception e) when (e is SqliteException or FormatException or InvalidCastException)
            {
                throw new ResultStoreException($"{Path}: the result file cannot be read: {e.Message}", e);
            }
        }
    }
}
