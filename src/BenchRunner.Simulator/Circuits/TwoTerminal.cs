using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// A component with two terminals (a resistor, capacitor, inductor or a combination of them),
/// described by its impedance against frequency. Placed in a network by <see cref="SeriesElement"/>
/// or <see cref="ShuntElement"/>. Implementations are immutable and do not allocate when evaluated.
/// Ideal parts at exactly a singular frequency (a lossless resonator at resonance) may give an
/// infinite impedance or admittance; real parts with their losses do not.
/// </summary>
public abstract class TwoTerminal
{
    /// <summary>The impedance in ohms at <paramref name="hertz"/> (above zero).</summary>
    public abstract Complex ImpedanceAt(double hertz);

    /// <summary>The admittance in siemens at <paramref name="hertz"/>: 1/Z unless a part computes it directly.</summary>
    public virtual Complex AdmittanceAt(double hertz) => 1 / ImpedanceAt(hertz);

    /// <summary>The angular frequency ω = 2π·f in radians per second.</summary>
    protected static double Omega(double hertz) => 2 * Math.PI * hertz;
}
