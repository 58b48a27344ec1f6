using BenchRunner.Core.Figures;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.LimitRecords;
using BenchRunner.Execution.Plans;
using BenchRunner.Storage;
using BenchRunner.Storage.Sqlite;
using Microsoft.Data.Sqlite;
using BenchRunner.Core.Runs;

namespace BenchRunner.Reports.Tests.Support;

/// <summary>A result file filled run by run, each a minute after the last, as a batch would fill it.</summary>
public sealed class LotStore : IDisposable
{
    private readonly TempDirectory _dir = new();
    private readonly ManualTimeProvider _clock = new(new DateTimeOffset(2026, 3, 2, 8, 0, 0, TimeSpan.Zero));

    public LotStore()
    {
        Store = SqliteResultStore.Open(_dir.PathOf("lot.db"), _clock);
        Plan = PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml"));
        PlanText = File.ReadAllText(RepositoryFiles.Example("plans/psf-137-check.yaml"));
    }

    public SqliteResultStore Store { get; }

    public TestPlan Plan { get; }

    public string PlanText { get; }

    /// <summary>S21 of the example board that passes (PSF-24-0001's file).</summary>
    public static Trace PassingS21 { get; } = TraceFile.Read(RepositoryFiles.Example("psf-24-0001.s2p")).Find(TraceQuantity.S21)!;

    /// <summary>S21 of the example board that fails the mask (PSF-24-0002's file).</summary>
    public static Trace FailingS21 { get; } = TraceFile.Read(RepositoryFiles.Example("psf-24-0002.s2p")).Find(TraceQuantity.S21)!;

    /// <summary>
    /// Adds a finished run of <paramref name="serial"/> with one passband sweep: its figures are
    /// those of <paramref name="trace"/>, or <paramref name="figures"/> when given; its checks are
    /// one per name in <paramref name="failed"/> (failing) plus one passing check.
    /// </summary>
    public long AddRun(string serial, RunStatus status, string[]? failed = null, Trace? trace = null,
        IReadOnlyList<NamedFigure>? figures = null, RunMode mode = RunMode.Batch, string lot = "PSF-24-L07", bool retest = false, bool finish = true)
    {
        _clock.Advance(TimeSpan.FromMinutes(1));
        var id = Store.StartRun(new RunRecord(mode, Plan.Name, PlanText, "0.1.0", "bench-pc")
        {
            BenchName = "virtual-bench",
            DutSerial = serial,
            Lot = lot,
            IsRetest = retest,
            Operator = "tester",
            ExtraJson = PlanLimits.From(Plan).ToRunJson(),
        });
        Store.AddInstrument(id, new InstrumentRecord("vna", "network-analyser", "BenchRunner", "SIM-VNA", "SV-0001", "1.0") { Connection = "sim:vna?dialect=raw" });
        var s21 = trace ?? PassingS21;
        var sweep = Store.AddSweep(id, new SweepRecord("passband sweep", s21)
        {
            InstrumentRole = "vna",
            TraceName = "passband",
            Figures = figures ?? FigureSummary.ForFilter(s21),
            AcquiredUtc = _clock.GetUtcNow(),
        });
        Store.AddCheck(id, new CheckRecord("bandwidth_3db_hz of passband", CheckKind.FigureLimit, true) { SweepId = sweep, Message = "fine" });
        foreach (var name in failed ?? [])
        {
            Store.AddCheck(id, new CheckRecord(name, name.StartsWith("mask", StringComparison.Ordinal) ? CheckKind.Mask : CheckKind.FigureLimit, false)
            {
                SweepId = sweep, Message = "outside", Margin = -0.5, MarginUnit = "dB",
            });
        }

        if (finish)
        {
            Store.FinishRun(id, status, status == RunStatus.Error ? "the analyser stopped answering" : null);
        }

        return id;
    }

    /// <summary>Adds one more sweep of the passband to run <paramref name="runId"/>, <paramref name="seconds"/> later.</summary>
    public void AddSweep(long runId, Trace trace, double seconds)
    {
        _clock.Advance(TimeSpan.FromSeconds(seconds));
        Store.AddSweep(runId, new SweepRecord("passband sweep", trace)
        {
            InstrumentRole = "vna",
            TraceName = "passband",
            Figures = FigureSummary.ForFilter(trace),
            AcquiredUtc = _clock.GetUtcNow(),
        });
    }

    /// <summary>The rows of <paramref name="sql"/> run on the file at <paramref name="path"/> with a plain SQLite connection.</summary>
    public static List<object?[]> Query(string path, string sql)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        var rows = new List<object?[]>();
        while (reader.Read())
        {
            var row = new object?[reader.FieldCount];
            for (int i = 0; i < row.Length; i++)
            {
                row[i] = reader.IsDBNull(i) ? null : reader.GetValue(i);
            }

            rows.Add(row);
        }

        return rows;
    }

    /// <summary>Figures with only a centre frequency of <paramref name="hertz"/>.</summary>
    public static IReadOnlyList<NamedFigure> Centre(double hertz) => [NamedFigure.Of(FigureKeys.CentreFrequency, hertz)];

    public void Dispose()
    {
        Store.Dispose();
        _dir.Dispose();
    }
}
