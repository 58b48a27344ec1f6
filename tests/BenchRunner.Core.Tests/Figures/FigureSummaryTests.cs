using BenchRunner.Core.Figures;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Tests.Figures;

public class FigureSummaryTests
{
    private static readonly string[] FilterKeys =
    [
        "peak_hz", "peak_db", "bandwidth_3db_hz", "center_hz", "loaded_q", "insertion_loss_db",
        "lower_3db_hz", "upper_3db_hz", "bandwidth_1db_hz", "shape_factor_60_3",
    ];

    [Fact]
    public void ForFilter_S21_HasTheFixedKeysAndUnloadedQ()
    {
        var figures = FigureSummary.ForFilter(TestTraces.SeriesResonator(9.5e6, 10.5e6, 2001));

        Assert.Equal([.. FilterKeys, "unloaded_q"], figures.Select(f => f.Key.Word));
    }

    [Fact]
    public void ForFilter_S11_HasNoUnloadedQ_AndNoInsertionLoss()
    {
        var s11 = TestTraces.FromDb(TraceQuantity.S11, [96e6, 100e6, 104e6], [-12, 0, -12]);

        var figures = FigureSummary.ForFilter(s11);

        Assert.Equal(FilterKeys, figures.Select(f => f.Key.Word));
        var loss = figures.Single(f => f.Key == FigureKeys.InsertionLoss);
        Assert.Null(loss.Value);
        Assert.Contains("transmission", loss.Reason);
    }

    [Fact]
    public void ForFilter_Values_AreTheFiguresInTheirUnits()
    {
        // Slopes of 3 dB/MHz: -3 dB at 99 and 101 MHz, -1 dB at 99.667 and 100.333 MHz,
        // -60 dB at 80 and 120 MHz; QL = 100/2 = 50 (calc).
        var trace = TestTraces.S21Mhz([79, 100, 121], [-63 - 1.5, -1.5, -63 - 1.5]);

        var figures = FigureSummary.ForFilter(trace).ToDictionary(f => f.Key.Word);

        Assert.Equal(100e6, figures["peak_hz"].Value!.Value.Value, 1e-3);
        Assert.Equal(-1.5, figures["peak_db"].Value!.Value.Value, 1e-9);
        Assert.Equal(2e6, figures["bandwidth_3db_hz"].Value!.Value.Value, 1e-3);
        Assert.Equal(100e6, figures["center_hz"].Value!.Value.Value, 1e-3);
        Assert.Equal(50, figures["loaded_q"].Value!.Value.Value, 1e-9);
        Assert.Equal(1.5, figures["insertion_loss_db"].Value!.Value.Value, 1e-9);
        Assert.Equal(99e6, figures["lower_3db_hz"].Value!.Value.Value, 1e-3);
        Assert.Equal(101e6, figures["upper_3db_hz"].Value!.Value.Value, 1e-3);
        Assert.Equal(2e6 / 3, figures["bandwidth_1db_hz"].Value!.Value.Value, 1e-3);
        Assert.Equal(20, figures["shape_factor_60_3"].Value!.Value.Value, 1e-9);
        Assert.Equal("Hz", figures["peak_hz"].Unit.Symbol);
        Assert.Equal("dB", figures["peak_db"].Unit.Symbol);
        Assert.Equal("", figures["loaded_q"].Unit.Symbol);
        Assert.All(figures.Values, f => Assert.Null(f.Reason));
    }

    [Fact]
    public void ForFilter_NoCrossing_GivesNullValuesWithReasons()
    {
        var trace = TestTraces.S21Mhz([136, 137, 138], [-10, -5, -1]);

        var figures = FigureSummary.ForFilter(trace).ToDictionary(f => f.Key.Word);

        foreach (var key in new[] { "bandwidth_3db_hz", "center_hz", "loaded_q", "lower_3db_hz", "upper_3db_hz", "unloaded_q" })
        {
            Assert.Null(figures[key].Value);
            Assert.False(string.IsNullOrWhiteSpace(figures[key].Reason), key);
        }

        Assert.Equal(138e6, figures["peak_hz"].Value?.Value);
    }

    [Fact]
    public void ForSpectrum_HasPeakNoiseFloorAndOccupiedBandwidth()
    {
        var spectrum = PowerFiguresPeaksTests.Spectrum();

        var figures = FigureSummary.ForSpectrum(spectrum);

        Assert.Equal(
            ["peak_hz", "peak_dbm", "noise_floor_dbm", "occupied_bandwidth_hz", "occupied_lower_hz", "occupied_upper_hz"],
            figures.Select(f => f.Key.Word));
        var byKey = figures.ToDictionary(f => f.Key.Word);
        Assert.Equal(PowerFigures.NoiseFloor(spectrum).Value.Dbm, byKey["noise_floor_dbm"].Value?.Value);
        Assert.Equal(PowerFigures.OccupiedBandwidth(spectrum).Value.Width.Hertz, byKey["occupied_bandwidth_hz"].Value?.Value);
        Assert.Equal("dBm", byKey["peak_dbm"].Unit.Symbol);
    }
}
