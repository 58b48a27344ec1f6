using BenchRunner.Storage.Sqlite;
using System.Numerics;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Storage.Tests.Support;
using BenchRunner.Core.Runs;

namespace BenchRunner.Storage.Tests;

public sealed class ResultStoreSweepTests : IDisposable
{
    private readonly TempDirectory _dir = new();
    private readonly ManualTimeProvider _clock = new();
    private readonly SqliteResultStore _store;

    public ResultStoreSweepTests() => _store = SqliteResultStore.Open(_dir.PathOf("results.db"), _clock);

    public void Dispose()
    {
        _store.Dispose();
        _dir.Dispose();
    }

    public static TheoryData<string> Axes => ["linear", "log", "list", "single"];

    [Theory]
    [MemberData(nameof(Axes))]
    public void GetSweeps_ComplexTrace_ComesBackBitForBit(string axisName)
    {
        var trace = Samples.Awkward(Axis(axisName));
        var runId = _store.StartRun(Samples.Run());
        _store.AddSweep(runId, new SweepRecord("reflection", trace));

        var stored = Assert.IsType<ComplexTrace>(Assert.Single(_store.GetSweeps(runId)).Record.Trace);

        Assert.Equal(TraceQuantity.S11, stored.Quantity);
        Assert.Equal(trace.Axis.Kind, stored.Axis.Kind);
        Assert.Equal(Bits(trace.Axis.Hertz), Bits(stored.Axis.Hertz));
        Assert.Equal(Bits(trace.Samples.Select(s => s.Real)), Bits(stored.Samples.Select(s => s.Real)));
        Assert.Equal(Bits(trace.Samples.Select(s => s.Imaginary)), Bits(stored.Samples.Select(s => s.Imaginary)));
    }

    [Theory]
    [MemberData(nameof(Axes))]
    public void GetSweeps_PowerTrace_ComesBackBitForBit(string axisName)
    {
        var axis = Axis(axisName);
        var trace = new PowerTrace(axis, Enumerable.Range(0, axis.Count).Select(i => -95.0 + i / 7.0 - (i % 3 == 0 ? 0.0 : 1e-13)));
        var runId = _store.StartRun(Samples.Run());
        _store.AddSweep(runId, new SweepRecord("spectrum", trace) { InstrumentRole = "sa" });

        var stored = Assert.IsType<PowerTrace>(Assert.Single(_store.GetSweeps(runId)).Record.Trace);

        Assert.Equal(TraceQuantity.Power, stored.Quantity);
        Assert.Equal(TraceUnit.DecibelMilliwatt, stored.Unit);
        Assert.Equal(trace.Axis.Kind, stored.Axis.Kind);
        Assert.Equal(Bits(trace.Axis.Hertz), Bits(stored.Axis.Hertz));
        Assert.Equal(Bits(trace.LevelsDb), Bits(stored.LevelsDb));
    }

    [Fact]
    public void AddSweep_LinearAxis_StoresNoPointListButALogAxisDoes()
    {
        var runId = _store.StartRun(Samples.Run());
        _store.AddSweep(runId, new SweepRecord("passband", Samples.PassbandS21()));
        _store.AddSweep(runId, new SweepRecord("wide", Samples.PassbandS21(Axis("log"))));

        var rows = StoreFile.Query(_store.Path, "SELECT axis_kind, start_hz, stop_hz, point_count, length(axis_hz), length(samples) FROM sweeps ORDER BY seq");

        Assert.Equal(new object?[] { "linear", 130e6, 145e6, 401L, null, 401L * 16 }, rows[0]);
        Assert.Equal(new object?[] { "log", 1e6, 1e9, 201L, 201L * 8, 201L * 16 }, rows[1]);
    }

    [Fact]
    public void AddSweep_ComplexSamples_AreStoredAsInterleavedLittleEndianDoubles()
    {
        var axis = FrequencyAxis.FromHertz([137.4e6, 137.6e6]);
        var runId = _store.StartRun(Samples.Run());
        _store.AddSweep(runId, new SweepRecord("two points", new ComplexTrace(axis, TraceQuantity.S21, [new Complex(1, -2), new Complex(0.5, 0)])));

        var samples = (byte[])StoreFile.Scalar(_store.Path, "SELECT samples FROM sweeps")!;

        // IEEE 754-2019 §3.4 binary64: 1.0 = 0x3FF0000000000000, -2.0 = 0xC000000000000000,
        // 0.5 = 0x3FE0000000000000, +0 = all zero bits; stored least significant byte first.
        Assert.Equal(Convert.FromHexString("000000000000F03F" + "00000000000000C0" + "000000000000E03F" + "0000000000000000"), samples);
    }

    [Fact]
    public void AddSweep_WithFigures_StoresValuesAndReasonsWithTheSweep()
    {
        var trace = Samples.PassbandS21();
        var figures = FigureSummary.ForFilter(trace);
        var runId = _store.StartRun(Samples.Run());
        var sweepId = _store.AddSweep(runId, new SweepRecord("passband", trace)
        {
            InstrumentRole = "vna",
            TraceName = "S21",
            SettingsJson = """{"ifbw_hz": 1000, "power_dbm": -10}""",
            Figures = figures,
            Flags = SweepFlags.Uncalibrated,
        });

        var sweep = Assert.Single(_store.GetSweeps(runId));

        Assert.Equal(sweepId, sweep.Id);
        Assert.Equal(1, sweep.Sequence);
        Assert.Equal("vna", sweep.Record.InstrumentRole);
        Assert.Equal("S21", sweep.Record.TraceName);
        Assert.Equal("""{"ifbw_hz": 1000, "power_dbm": -10}""", sweep.Record.SettingsJson);
        Assert.Equal(SweepFlags.Uncalibrated, sweep.Record.Flags);
        Assert.Equal(figures, sweep.Record.Figures);
        Assert.Equal(figures, _store.GetFigures(runId).Select(f => f.Figure));

        // The resonator's -3 dB bandwidth is f0 / Q = 3 MHz, about its 137.5 MHz centre.
        // Pozar, Microwave Engineering, ch. 6 (loaded Q of a resonator, Q = f0 / BW).
        var bandwidth = figures.Single(f => f.Key == FigureKeys.Bandwidth3Db).Value!.Value.Value;
        Assert.Equal(3e6, bandwidth, 3e6 * 0.01);
        Assert.Equal(bandwidth, (double)StoreFile.Scalar(_store.Path, "SELECT value FROM figures WHERE key = 'bandwidth_3db_hz'")!);
    }

    [Fact]
    public void AddSweep_UnavailableFigure_KeepsItsReasonAndNoValue()
    {
        var runId = _store.StartRun(Samples.Run());
        _store.AddSweep(runId, new SweepRecord("passband", Samples.PassbandS21())
        {
            Figures = [NamedFigure.Unavailable(FigureKeys.ShapeFactor60To3, "the trace never falls 60 dB below its peak")],
        });

        var figure = Assert.Single(_store.GetFigures(runId)).Figure;

        Assert.Null(figure.Value);
        Assert.Equal("the trace never falls 60 dB below its peak", figure.Reason);
    }

    [Fact]
    public void AddSweep_SequenceNumbers_CountWithinEachRun()
    {
        var first = _store.StartRun(Samples.Run("PSF-24-0001"));
        var second = _store.StartRun(Samples.Run("PSF-24-0002"));
        _store.AddSweep(first, new SweepRecord("a", Samples.PassbandS21()));
        _store.AddSweep(second, new SweepRecord("a", Samples.PassbandS21()));
        _store.AddSweep(first, new SweepRecord("b", Samples.Spectrum()));

        Assert.Equal([1, 2], _store.GetSweeps(first).Select(s => s.Sequence));
        Assert.Equal(["a", "b"], _store.GetSweeps(first).Select(s => s.Record.StepName));
        Assert.Equal([1], _store.GetSweeps(second).Select(s => s.Sequence));
    }

    [Fact]
    public void AddSweep_AcquiredTime_DefaultsToTheClockAndIsKeptInUtc()
    {
        var runId = _store.StartRun(Samples.Run());
        _clock.Advance(TimeSpan.FromSeconds(2.5));
        _store.AddSweep(runId, new SweepRecord("now", Samples.Spectrum()));
        var given = new DateTimeOffset(2025, 3, 14, 11, 45, 10, 123, TimeSpan.FromHours(2)).AddTicks(4567);
        _store.AddSweep(runId, new SweepRecord("given", Samples.Spectrum()) { AcquiredUtc = given });

        var stamps = StoreFile.Query(_store.Path, "SELECT acquired_utc FROM sweeps ORDER BY seq").Select(r => (string)r[0]!).ToList();

        // ISO 8601 / RFC 3339 §5.6 in UTC ("Z"), cut to whole milliseconds.
        Assert.Equal(["2025-03-14T09:30:02.500Z", "2025-03-14T09:45:10.123Z"], stamps);
        var read = _store.GetSweeps(runId).Select(s => s.Record.AcquiredUtc!.Value).ToList();
        Assert.Equal(given.AddTicks(-4567), read[1]);
        Assert.Equal(TimeSpan.Zero, read[1].Offset);
    }

    [Fact]
    public void AddSweep_BadFigures_AreRefusedBeforeAnythingIsWritten()
    {
        var runId = _store.StartRun(Samples.Run());
        var trace = Samples.PassbandS21();

        // A figure with both or neither of value and reason, or an infinite value, cannot even be
        // made (NamedFigure refuses it at the door); a repeated key is the store's to refuse.
        Assert.Throws<ArgumentException>(() => _store.AddSweep(runId, new SweepRecord("x", trace)
        {
            Figures = [new NamedFigure(FigureKeys.CentreFrequency, Quantity.Of(137.5e6, QuantityUnit.Hertz), "and a reason")],
        }));
        Assert.Throws<ArgumentException>(() => _store.AddSweep(runId, new SweepRecord("x", trace)
        {
            Figures = [new NamedFigure(FigureKeys.CentreFrequency, null, null)],
        }));
        var q = FigureKey.Unlisted("q", "Q", QuantityUnit.None);
        Assert.Throws<ArgumentException>(() => _store.AddSweep(runId, new SweepRecord("x", trace)
        {
            Figures = [NamedFigure.Of(q, 45), NamedFigure.Of(q, 46)],
        }));
        Assert.ThrowsAny<ArgumentException>(() => _store.AddSweep(runId, new SweepRecord("x", trace)
        {
            Figures = [NamedFigure.Of(q, double.PositiveInfinity)],
        }));
        Assert.Throws<ArgumentException>(() => _store.AddSweep(runId, new SweepRecord("x", trace) { SettingsJson = "{span: 3 MHz}" }));
        Assert.Throws<ArgumentException>(() => _store.AddSweep(runId, new SweepRecord("x", trace) { Flags = (SweepFlags)64 }));
        Assert.Throws<ArgumentException>(() => _store.AddSweep(runId, new SweepRecord(" ", trace)));

        Assert.Empty(_store.GetSweeps(runId));
        Assert.Equal(0L, StoreFile.Scalar(_store.Path, "SELECT count(*) FROM figures"));
    }

    [Fact]
    public void AddSweep_UnknownOrFinishedRun_IsRefused()
    {
        var runId = _store.StartRun(Samples.Run());
        _store.FinishRun(runId, RunStatus.Passed);

        Assert.Throws<ArgumentException>(() => _store.AddSweep(runId + 100, new SweepRecord("x", Samples.Spectrum())));
        var error = Assert.Throws<InvalidOperationException>(() => _store.AddSweep(runId, new SweepRecord("x", Samples.Spectrum())));
        Assert.Contains("already finished (passed)", error.Message);
    }

    private static FrequencyAxis Axis(string name) => name switch
    {
        "linear" => FrequencyAxis.Linear(Frequency.FromMegahertz(130), Frequency.FromMegahertz(145), 401),
        "log" => FrequencyAxis.Logarithmic(Frequency.FromMegahertz(1), Frequency.FromGigahertz(1), 201),
        "list" => FrequencyAxis.FromHertz([21.4e6, 21.4e6 + 1.0 / 3, 137.5e6, 137.5e6 + 1e-7, 1e9 / 3]),
        "single" => FrequencyAxis.Linear(Frequency.FromMegahertz(137.5), Frequency.FromMegahertz(137.5), 1),
        _ => throw new ArgumentOutOfRangeException(nameof(name)),
    };

    private static long[] Bits(IEnumerable<double> values) => values.Select(BitConverter.DoubleToInt64Bits).ToArray();
}
