using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Figures;

/// <summary>
/// Every figure the program computes, each with its stored word, label and unit, in one place.
/// The words are those of earlier versions: stored data and plan files keep them.
/// </summary>
public static class FigureKeys
{
    /// <summary><c>peak_hz</c>: frequency of the highest point, refined.</summary>
    public static FigureKey PeakFrequency { get; } = FigureKey.Define("peak_hz", "Peak frequency", QuantityUnit.Hertz);

    /// <summary><c>peak_db</c>: level of the highest point of an S-parameter trace.</summary>
    public static FigureKey PeakLevel { get; } = FigureKey.Define("peak_db", "Peak level", QuantityUnit.Decibel);

    /// <summary><c>bandwidth_3db_hz</c>: width between the points 3 dB below the peak.</summary>
    public static FigureKey Bandwidth3Db { get; } = FigureKey.Define("bandwidth_3db_hz", "-3 dB bandwidth", QuantityUnit.Hertz);

    /// <summary><c>center_hz</c>: the middle of the -3 dB band.</summary>
    public static FigureKey CentreFrequency { get; } = FigureKey.Define("center_hz", "Centre frequency (-3 dB)", QuantityUnit.Hertz);

    /// <summary><c>loaded_q</c>: centre frequency over -3 dB bandwidth.</summary>
    public static FigureKey LoadedQ { get; } = FigureKey.Define("loaded_q", "Loaded Q (-3 dB)", QuantityUnit.None);

    /// <summary><c>insertion_loss_db</c>: loss at the peak of a transmission trace.</summary>
    public static FigureKey InsertionLoss { get; } = FigureKey.Define("insertion_loss_db", "Insertion loss", QuantityUnit.Decibel);

    /// <summary><c>lower_3db_hz</c>: lower edge of the -3 dB band.</summary>
    public static FigureKey Lower3Db { get; } = FigureKey.Define("lower_3db_hz", "Lower -3 dB edge", QuantityUnit.Hertz);

    /// <summary><c>upper_3db_hz</c>: upper edge of the -3 dB band.</summary>
    public static FigureKey Upper3Db { get; } = FigureKey.Define("upper_3db_hz", "Upper -3 dB edge", QuantityUnit.Hertz);

    /// <summary><c>bandwidth_1db_hz</c>: width between the points 1 dB below the peak.</summary>
    public static FigureKey Bandwidth1Db { get; } = FigureKey.Define("bandwidth_1db_hz", "-1 dB bandwidth", QuantityUnit.Hertz);

    /// <summary><c>shape_factor_60_3</c>: -60 dB bandwidth over -3 dB bandwidth.</summary>
    public static FigureKey ShapeFactor60To3 { get; } = FigureKey.Define("shape_factor_60_3", "Shape factor 60/3 dB", QuantityUnit.None);

    /// <summary><c>unloaded_q</c>: the resonator's own Q, from an S21 trace.</summary>
    public static FigureKey UnloadedQ { get; } = FigureKey.Define("unloaded_q", "Unloaded Q", QuantityUnit.None);

    /// <summary><c>peak_dbm</c>: level of the highest line of a power trace.</summary>
    public static FigureKey PeakPower { get; } = FigureKey.Define("peak_dbm", "Peak level", QuantityUnit.DecibelMilliwatt);

    /// <summary><c>noise_floor_dbm</c>: median level of a power trace.</summary>
    public static FigureKey NoiseFloor { get; } = FigureKey.Define("noise_floor_dbm", "Noise floor (median)", QuantityUnit.DecibelMilliwatt);

    /// <summary><c>occupied_bandwidth_hz</c>: width holding 99 % of the power.</summary>
    public static FigureKey OccupiedBandwidth { get; } = FigureKey.Define("occupied_bandwidth_hz", "Occupied bandwidth (99 %)", QuantityUnit.Hertz);

    /// <summary><c>occupied_lower_hz</c>: lower edge of the occupied band.</summary>
    public static FigureKey OccupiedLower { get; } = FigureKey.Define("occupied_lower_hz", "Occupied band lower edge", QuantityUnit.Hertz);

    /// <summary><c>occupied_upper_hz</c>: upper edge of the occupied band.</summary>
    public static FigureKey OccupiedUpper { get; } = FigureKey.Define("occupied_upper_hz", "Occupied band upper edge", QuantityUnit.Hertz);

    /// <summary><c>mask_margin_db</c>: the worst margin of a trace to its mask (positive inside), shown while tuning.</summary>
    public static FigureKey MaskMargin { get; } = FigureKey.Define("mask_margin_db", "Worst mask margin", QuantityUnit.Decibel);

    /// <summary>Every key above, in that order.</summary>
    public static IReadOnlyList<FigureKey> All { get; } =
    [
        PeakFrequency, PeakLevel, Bandwidth3Db, CentreFrequency, LoadedQ, InsertionLoss, Lower3Db, Upper3Db,
        Bandwidth1Db, ShapeFactor60To3, UnloadedQ, PeakPower, NoiseFloor, OccupiedBandwidth, OccupiedLower,
        OccupiedUpper, MaskMargin,
    ];

    /// <summary>The key stored as <paramref name="word"/> (exact, case-sensitive), or null.</summary>
    public static FigureKey? Find(string? word) => All.FirstOrDefault(k => k.Word == word);
}
