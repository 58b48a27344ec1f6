using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Masks;

/// <summary>
/// One corner of a limit line: a frequency and the limit's level there, in the mask's unit
/// (dB, dBm, or dB from the peak for a relative mask).
/// </summary>
public readonly record struct MaskCorner
{
    /// <summary>Creates a corner.</summary>
    /// <param name="frequency">Where the corner is.</param>
    /// <param name="levelDb">The limit's level at the corner, in dB or dBm.</param>
    /// <exception cref="ArgumentOutOfRangeException">The level is NaN or infinite.</exception>
    public MaskCorner(Frequency frequency, double levelDb)
    {
        if (!double.IsFinite(levelDb))
        {
            throw new ArgumentOutOfRangeException(nameof(levelDb), levelDb, "A corner's level must be finite.");
        }

        Frequency = frequency;
        LevelDb = levelDb;
    }

    /// <summary>Where the corner is.</summary>
    public Frequency Frequency { get; }

    /// <summary>The limit's level at the corner, in the mask's unit (dB or dBm).</summary>
    public double LevelDb { get; }

    /// <summary>Splits the corner into its frequency and level.</summary>
    public void Deconstruct(out Frequency frequency, out double levelDb)
    {
        frequency = Frequency;
        levelDb = LevelDb;
    }

    /// <summary>Formats as e.g. <c>131 MHz: -25</c> (the unit belongs to the mask).</summary>
    public override string ToString() => $"{Frequency}: {QuantityText.Invariant(LevelDb)}";
}
