using System.Numerics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.RfMath;

/// <summary>
/// Reflection at a mismatched port (Pozar, <i>Microwave Engineering</i>, ch. 2):
/// |Γ| = (VSWR − 1)/(VSWR + 1), VSWR = (1 + |Γ|)/(1 − |Γ|), return loss RL = −20·log10|Γ|,
/// mismatch loss ML = −10·log10(1 − |Γ|²), Γ = (Z − Z0)/(Z + Z0), Z = Z0·(1 + Γ)/(1 − Γ).
/// Magnitudes |Γ| are linear and unitless; only passive loads (|Γ| ≤ 1) are accepted.
/// </summary>
public static class Mismatch
{
    /// <summary>The reflection magnitude for a VSWR: |Γ| = (VSWR − 1)/(VSWR + 1).</summary>
    /// <exception cref="ArgumentOutOfRangeException">VSWR is NaN, infinite or below 1.</exception>
    public static double ReflectionMagnitudeFromVswr(double vswr)
    {
        if (!double.IsFinite(vswr) || vswr < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(vswr), vswr, "A VSWR must be finite and at least 1.");
        }

        return (vswr - 1) / (vswr + 1);
    }

    /// <summary>The VSWR for a reflection magnitude: VSWR = (1 + |Γ|)/(1 − |Γ|).</summary>
    /// <exception cref="ArgumentOutOfRangeException">|Γ| is NaN, negative, or 1 or more (infinite VSWR).</exception>
    public static double VswrFromReflectionMagnitude(double reflectionMagnitude)
    {
        CheckBelowOne(reflectionMagnitude, nameof(reflectionMagnitude));
        return (1 + reflectionMagnitude) / (1 - reflectionMagnitude);
    }

    /// <summary>The return loss for a reflection magnitude: RL = −20·log10|Γ| (positive dB).</summary>
    /// <exception cref="ArgumentOutOfRangeException">|Γ| is NaN, zero (infinite return loss), negative or above 1.</exception>
    public static Ratio ReturnLossFromReflectionMagnitude(double reflectionMagnitude)
    {
        if (!(reflectionMagnitude > 0 && reflectionMagnitude <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(reflectionMagnitude), reflectionMagnitude,
                "A reflection magnitude must be above 0 and at most 1 to have a return loss.");
        }

        return Ratio.FromDecibels(-20 * Math.Log10(reflectionMagnitude));
    }

    /// <summary>The reflection magnitude for a return loss: |Γ| = 10^(−RL/20).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The return loss is negative (an active load).</exception>
    public static double ReflectionMagnitudeFromReturnLoss(Ratio returnLoss)
    {
        if (returnLoss.Decibels < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(returnLoss), returnLoss.Decibels, "A return loss must not be negative.");
        }

        return Math.Pow(10, -returnLoss.Decibels / 20);
    }

    /// <summary>The VSWR for a return loss: VSWR = (1 + |Γ|)/(1 − |Γ|) with |Γ| = 10^(−RL/20).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The return loss is not above 0 dB.</exception>
    public static double VswrFromReturnLoss(Ratio returnLoss)
    {
        if (!(returnLoss.Decibels > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(returnLoss), returnLoss.Decibels, "A return loss must be above 0 dB to give a finite VSWR.");
        }

        return VswrFromReflectionMagnitude(ReflectionMagnitudeFromReturnLoss(returnLoss));
    }

    /// <summary>
    /// The mismatch loss, the power not delivered because of reflection:
    /// ML = −10·log10(1 − |Γ|²) (positive dB).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">|Γ| is NaN, negative, or 1 or more (all power reflected).</exception>
    public static Ratio MismatchLossFromReflectionMagnitude(double reflectionMagnitude)
    {
        CheckBelowOne(reflectionMagnitude, nameof(reflectionMagnitude));
        return Ratio.FromDecibels(-10 * Math.Log10(1 - reflectionMagnitude * reflectionMagnitude));
    }

    /// <summary>
    /// The reflection coefficient of a load: Γ = (Z − Z0)/(Z + Z0).
    /// </summary>
    /// <param name="loadOhms">The complex load impedance in ohms.</param>
    /// <param name="referenceImpedance">The real reference impedance Z0; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The load is not finite, Z + Z0 is zero, or Z0 is zero.</exception>
    public static Complex ReflectionFromImpedance(Complex loadOhms, Resistance? referenceImpedance = null)
    {
        var z0 = SystemImpedance.OhmsOrDefault(referenceImpedance, nameof(referenceImpedance));
        if (!double.IsFinite(loadOhms.Real) || !double.IsFinite(loadOhms.Imaginary) || loadOhms + z0 == Complex.Zero)
        {
            throw new ArgumentOutOfRangeException(nameof(loadOhms), loadOhms, "The load impedance must be finite and Z + Z0 must not be zero.");
        }

        return (loadOhms - z0) / (loadOhms + z0);
    }

    /// <summary>
    /// The impedance seen looking into a port with reflection coefficient Γ:
    /// Z = Z0·(1 + Γ)/(1 − Γ), in ohms.
    /// </summary>
    /// <param name="reflection">The complex reflection coefficient (linear, e.g. S11).</param>
    /// <param name="referenceImpedance">The real reference impedance Z0; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">Γ is not finite, Γ = 1 (an open: infinite impedance), or Z0 is zero.</exception>
    public static Complex ImpedanceFromReflection(Complex reflection, Resistance? referenceImpedance = null)
    {
        var z0 = SystemImpedance.OhmsOrDefault(referenceImpedance, nameof(referenceImpedance));
        if (!double.IsFinite(reflection.Real) || !double.IsFinite(reflection.Imaginary) || reflection == Complex.One)
        {
            throw new ArgumentOutOfRangeException(nameof(reflection), reflection, "The reflection must be finite and not exactly 1 (an open).");
        }

        return z0 * (1 + reflection) / (1 - reflection);
    }

    private static void CheckBelowOne(double reflectionMagnitude, string paramName)
    {
        if (!(reflectionMagnitude >= 0 && reflectionMagnitude < 1))
        {
            throw new ArgumentOutOfRangeException(paramName, reflectionMagnitude, "A reflection magnitude must be at least 0 and below 1.");
        }
    }
}
