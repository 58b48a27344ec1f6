using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>An impedance (or admittance) that does not change with frequency.</summary>
public sealed class FixedImpedance : TwoTerminal
{
    private readonly Complex _ohms;
    private readonly Complex _siemens;

    private FixedImpedance(Complex ohms, Complex siemens)
    {
        _ohms = ohms;
        _siemens = siemens;
    }

    /// <summary>An impedance of <paramref name="ohms"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite.</exception>
    public static FixedImpedance FromOhms(Complex ohms)
    {
        CheckFinite(ohms, nameof(ohms));
        return new FixedImpedance(ohms, 1 / ohms);
    }

    /// <summary>An admittance of <paramref name="siemens"/> (zero is an open).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite.</exception>
    public static FixedImpedance FromAdmittance(Complex siemens)
    {
        CheckFinite(siemens, nameof(siemens));
        return new FixedImpedance(1 / siemens, siemens);
    }

    /// <inheritdoc/>
    public override Complex ImpedanceAt(double hertz) => _ohms;

    /// <inheritdoc/>
    public override Complex AdmittanceAt(double hertz) => _siemens;

    private static void CheckFinite(Complex value, string paramName)
    {
        if (!double.IsFinite(value.Real) || !double.IsFinite(value.Imaginary))
        {
            throw new ArgumentOutOfRangeException(paramName, value, "Must be finite.");
        }
    }
}
