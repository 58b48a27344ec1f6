using BenchRunner.Core.Traces;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// The figures a plan may check, the same keys as <c>FigureSummary.ForFilter</c> and
/// <c>FigureSummary.ForSpectrum</c> report (a test keeps the two lists in step).
/// </summary>
public static class FigureCatalogue
{
    /// <summary>Every figure.</summary>
    public static readonly IReadOnlyList<FigureDefinition> All =
    [
        new("peak_hz", "Hz", false), new("peak_db", "dB", false), new("bandwidth_3db_hz", "Hz", false),
        new("center_hz", "Hz", false), new("loaded_q", "", false), new("insertion_loss_db", "dB", false),
        new("lower_3db_hz", "Hz", false), new("upper_3db_hz", "Hz", false), new("bandwidth_1db_hz", "Hz", false),
        new("shape_factor_60_3", "", false), new("unloaded_q", "", false, S21Only: true),
        new("peak_hz", "Hz", true), new("peak_dbm", "dBm", true), new("noise_floor_dbm", "dBm", true),
        new("occupied_bandwidth_hz", "Hz", true), new("occupied_lower_hz", "Hz", true), new("occupied_upper_hz", "Hz", true),
    ];

    /// <summary>The figures of a trace of <paramref name="quantity"/>.</summary>
    public static IEnumerable<FigureDefinition> For(TraceQuantity quantity) =>
        All.Where(f => f.OfSpectrum == (quantity == TraceQuantity.Power) && (!f.S21Only || quantity == TraceQuantity.S21));

    /// <summary>The figure <paramref name="key"/> of a trace of <paramref name="quantity"/>, or null.</summary>
    public static FigureDefinition? Find(string key, TraceQuantity quantity) => For(quantity).FirstOrDefault(f => f.Key == key);

    /// <summary>The figure <paramref name="key"/> of any kind of trace, or null when no trace has it.</summary>
    public static FigureDefinition? FindAny(string key) => All.FirstOrDefault(f => f.Key == key);
}
