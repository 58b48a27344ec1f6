namespace BenchRunner.Core.Validity;

/// <summary>What a spectral line was recognised as.</summary>
public enum PeakOrigin
{
    /// <summary>None of the carriers, harmonics or two-tone products fits within the tolerance.</summary>
    Unidentified,

    /// <summary>One of the carriers.</summary>
    Carrier,

    /// <summary>The n-th harmonic (n·f, n = 2 to 5) of one carrier.</summary>
    Harmonic,

    /// <summary>A two-tone product of two carriers: 2f1 − f2, 2f2 − f1, f1 + f2 or f2 − f1.</summary>
    TwoToneProduct,
}
