using System.Globalization;
using BenchRunner.Simulator.Circuits;

namespace BenchRunner.Simulator.Devices;

/// <summary>
/// A production lot of 137 MHz preselector boards with serials <c>PSF-24-0001</c>, <c>PSF-24-0002</c>, …
/// Each board's parts are drawn around <see cref="Preselector137.NominalParts"/> within
/// <see cref="LotTolerances"/> from a seeded generator, then the assembler aligns it (see
/// <see cref="Preselector137.Align"/>) with a small setting error. Trimmers cover the spread of
/// the fixed capacitors and most of the coils'; a board whose coil is far enough off runs a
/// trimmer to the end of its travel and cannot be aligned, and low-Q coils cost loss, so a lot
/// holds a few genuine failures. The same seed always gives the same lot.
/// </summary>
public sealed class BoardLot
{
    /// <summary>The seed used when none is given.</summary>
    public const int DefaultSeed = 73;

    /// <summary>The serial prefix of this year's preselector boards.</summary>
    public const string DefaultSerialPrefix = "PSF-24-";

    private BoardLot(int seed, LotTolerances tolerances, IReadOnlyList<PreselectorBoard> boards)
    {
        Seed = seed;
        Tolerances = tolerances;
        Boards = boards;
    }

    /// <summary>The seed the lot was drawn with.</summary>
    public int Seed { get; }

    /// <summary>The tolerances the lot was drawn with.</summary>
    public LotTolerances Tolerances { get; }

    /// <summary>The boards in serial order.</summary>
    public IReadOnlyList<PreselectorBoard> Boards { get; }

    /// <summary>Draws a lot.</summary>
    /// <param name="count">How many boards, 1 to 9999; 20 by default.</param>
    /// <param name="seed">The generator's seed; <see cref="DefaultSeed"/> by default.</param>
    /// <param name="tolerances">The spreads; <see cref="LotTolerances.Default"/> when null.</param>
    /// <param name="serialPrefix">The text before the four-digit board number; <see cref="DefaultSerialPrefix"/> by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A count outside 1 to 9999, or a negative tolerance.</exception>
    public static BoardLot Generate(int count = 20, int seed = DefaultSeed, LotTolerances? tolerances = null, string serialPrefix = DefaultSerialPrefix)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(count, 9999);
        ArgumentNullException.ThrowIfNull(serialPrefix);
        var t = tolerances ?? LotTolerances.Default;
        Check(t);

        var random = new SeededRandom(seed);
        var boards = new PreselectorBoard[count];
        for (int i = 0; i < count; i++)
        {
            var parts = DrawParts(random, t);
            var aligned = Preselector137.Align(parts);
            var set = TrimmerSettings.FromPicofarads(
                Setting(random, t, aligned.InputPicofarads),
                Setting(random, t, aligned.MiddlePicofarads),
                Setting(random, t, aligned.OutputPicofarads));
            var serial = serialPrefix + (i + 1).ToString("0000", CultureInfo.InvariantCulture);
            boards[i] = new PreselectorBoard(serial, parts, set);
        }

        return new BoardLot(seed, t, boards);
    }

    private static PreselectorParts DrawParts(SeededRandom random, LotTolerances t)
    {
        var nominal = Preselector137.NominalParts;
        double Cap(double farads) => Vary(random, farads, t.CapacitorFraction);
        ResonatorParts Resonator(ResonatorParts r) => new(
            CoilHenries: Vary(random, r.CoilHenries, t.CoilFraction),
            CoilQ: Math.Max(0.3 * r.CoilQ, r.CoilQ * (1 + t.CoilQSigmaFraction * random.NextNormal())),
            CoilSelfFarads: Vary(random, r.CoilSelfFarads, t.CoilSelfCapacitanceFraction),
            FixedFarads: Cap(r.FixedFarads));

        return nominal with
        {
            Input = Resonator(nominal.Input),
            Middle = Resonator(nominal.Middle),
            Output = Resonator(nominal.Output),
            InputCouplingFarads = Cap(nominal.InputCouplingFarads),
            InputTopFarads = Cap(nominal.InputTopFarads),
            OutputTopFarads = Cap(nominal.OutputTopFarads),
            OutputCouplingFarads = Cap(nominal.OutputCouplingFarads),
        };
    }

    private static double Vary(SeededRandom random, double nominal, double fraction) =>
        fraction == 0 ? nominal : nominal * random.NextTruncatedNormal(1, fraction / 3);

    private static double Setting(SeededRandom random, LotTolerances t, double ideal) =>
        Math.Clamp(ideal + t.TrimmerSettingSigmaPicofarads * random.NextNormal(),
            Preselector137.TrimmerMinimumPicofarads, Preselector137.TrimmerMaximumPicofarads);

    private static void Check(LotTolerances t)
    {
        foreach (var (value, name) in new[]
        {
            (t.CapacitorFraction, nameof(t.CapacitorFraction)),
            (t.CoilFraction, nameof(t.CoilFraction)),
            (t.CoilQSigmaFraction, nameof(t.CoilQSigmaFraction)),
            (t.CoilSelfCapacitanceFraction, nameof(t.CoilSelfCapacitanceFraction)),
            (t.TrimmerSettingSigmaPicofarads, nameof(t.TrimmerSettingSigmaPicofarads)),
        })
        {
            if (!double.IsFinite(value) || value < 0 || (name != nameof(t.TrimmerSettingSigmaPicofarads) && value >= 1))
            {
                throw new ArgumentOutOfRangeException(nameof(t), value, $"{name} must be a finite, non-negative fraction below 1 (or, for the trimmer setting, a non-negative number of pF).");
            }
        }
    }
}
