using BenchRunner.Core.Statistics;

namespace BenchRunner.Core.Tests.Statistics;

public sealed class ProcessCapabilityTests
{
    [Fact]
    public void FromMoments_HandbookExample_GivesCpk1667()
    {
        // REFERENCES: NIST/SEMATECH e-Handbook of Statistical Methods §6.1.6 (calc):
        // μ = 137.5, σ = 0.2, LSL 136.5, USL 138.7 → Cpk = min(1.2, 1.0)/0.6 = 1.667.
        var result = ProcessCapability.FromMoments(137.5, 0.2, 136.5, 138.7);

        Assert.True(result.IsAvailable);
        Assert.Equal(1.0 / 0.6, result.Value.Cpk, 9);
        Assert.Equal(1.667, result.Value.Cpk, 3);
        Assert.Equal(1.2 / 0.6, result.Value.CpkUpper!.Value, 9);
        Assert.Equal(1.0 / 0.6, result.Value.CpkLower!.Value, 9);
        // Same section: Cp = (USL − LSL)/(6σ) = 2.2/1.2 = 1.833 (calc).
        Assert.Equal(2.2 / 1.2, result.Value.Cp!.Value, 9);
    }

    [Fact]
    public void FromMoments_UpperLimitOnly_IsOneSidedWithoutCp()
    {
        // REFERENCES: NIST/SEMATECH §6.1.6, one-sided Cpu = (USL − μ)/(3σ); calc: (138.7 − 137.5)/0.6 = 2.0.
        var result = ProcessCapability.FromMoments(137.5, 0.2, null, 138.7);

        Assert.Equal(2.0, result.Value.Cpk, 9);
        Assert.Null(result.Value.Cp);
        Assert.Null(result.Value.CpkLower);
    }

    [Fact]
    public void FromMoments_LowerLimitOnly_IsOneSided()
    {
        // REFERENCES: NIST/SEMATECH §6.1.6, one-sided Cpl = (μ − LSL)/(3σ); calc: (137.5 − 136.5)/0.6 = 1.667.
        var result = ProcessCapability.FromMoments(137.5, 0.2, 136.5, null);

        Assert.Equal(1.0 / 0.6, result.Value.Cpk, 9);
        Assert.Null(result.Value.Cp);
        Assert.Null(result.Value.CpkUpper);
    }

    [Fact]
    public void Compute_FromSamples_UsesSampleDeviation()
    {
        // calc: 2,4,4,4,5,5,7,9 has mean 5 and s = sqrt(32/7); against LSL 0, USL 12:
        // Cpk = min(7, 5)/(3s) = 5/(3·2.13809) = 0.77952.
        var stats = SampleStatistics.From([2, 4, 4, 4, 5, 5, 7, 9]);

        var result = ProcessCapability.Compute(stats, 0, 12);

        Assert.Equal(5.0 / (3 * Math.Sqrt(32.0 / 7.0)), result.Value.Cpk, 9);
        Assert.Equal(0.7795, result.Value.Cpk, 4);
    }

    [Fact]
    public void Compute_NoSpread_IsUnavailableWithAReason()
    {
        var result = ProcessCapability.Compute(SampleStatistics.From([20.1, 20.1, 20.1]), 18, 22);

        Assert.False(result.IsAvailable);
        Assert.Contains("σ = 0", result.Reason);
    }

    [Fact]
    public void Compute_OneSample_IsUnavailableWithAReason()
    {
        var result = ProcessCapability.Compute(SampleStatistics.From([20.1]), 18, 22);

        Assert.False(result.IsAvailable);
        Assert.Contains("at least 2 samples", result.Reason);
    }

    [Fact]
    public void FromMoments_NoLimits_OrCrossedLimits_AreRefused()
    {
        Assert.Throws<ArgumentException>(() => ProcessCapability.FromMoments(1, 0.1, null, null));
        Assert.Throws<ArgumentException>(() => ProcessCapability.FromMoments(1, 0.1, 2, 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => ProcessCapability.FromMoments(1, -0.1, 0, 2));
        Assert.Throws<ArgumentOutOfRangeException>(() => ProcessCapability.FromMoments(double.NaN, 0.1, 0, 2));
    }
}
