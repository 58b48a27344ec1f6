namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// The spectral lines of an angle-modulated carrier relative to its centre and total power:
/// offsets in hertz and shares of the power summing to 1 (less the pruned tail). Immutable.
/// </summary>
/// <remarks>
/// A carrier phase-modulated by one tone of index β at rate fm has lines at n·fm with power
/// shares J_n(β)² (n = …, −1, 0, 1, …), by the Jacobi–Anger expansion; several tones give the
/// convolution of their line sets. Lines below <see cref="PruneShare"/> of the total are left out:
/// that is the model's dynamic range for modulation sidebands.
/// </remarks>
internal sealed class LineShape
{
    /// <summary>Lines holding less than this share of the power (−150 dBc) are dropped.</summary>
    public const double PruneShare = 1e-15;

    public static readonly LineShape Unmodulated = new([0.0], [1.0]);

    private LineShape(double[] offsetsHz, double[] shares)
    {
        OffsetsHz = offsetsHz;
        Shares = shares;
        ReachHz = offsetsHz.Length == 0 ? 0 : offsetsHz.Max(Math.Abs);
    }

    /// <summary>The line offsets from the centre, in hertz.</summary>
    public double[] OffsetsHz { get; }

    /// <summary>Each line's share of the total power.</summary>
    public double[] Shares { get; }

    /// <summary>The largest |offset|: no line lies farther from the centre.</summary>
    public double ReachHz { get; }

    /// <summary>The line set of a carrier modulated by all of <paramref name="tones"/> at once.</summary>
    public static LineShape Of(IReadOnlyList<ModulationTone> tones)
    {
        var offsets = new List<double> { 0.0 };
        var shares = new List<double> { 1.0 };
        foreach (var tone in tones)
        {
            if (tone.Index == 0)
            {
                continue;
            }

            int reach = Bessel.SidebandReach(tone.Index);
            var j = Bessel.FirstKind(tone.Index, reach);
            var nextOffsets = new List<double>(offsets.Count * (2 * reach + 1));
            var nextShares = new List<double>(nextOffsets.Capacity);
            for (int i = 0; i < offsets.Count; i++)
            {
                for (int n = -reach; n <= reach; n++)
                {
                    // J_−n(β) = (−1)^n·J_n(β), so both sides share J_|n|².
                    double share = shares[i] * j[Math.Abs(n)] * j[Math.Abs(n)];
                    if (share >= PruneShare)
                    {
                        nextOffsets.Add(offsets[i] + n * tone.Rate.Hertz);
                        nextShares.Add(share);
                    }
                }
            }

            offsets = nextOffsets;
            shares = nextShares;
        }

        return offsets.Count == 1 && offsets[0] == 0 ? Unmodulated : new LineShape([.. offsets], [.. shares]);
    }
}
