using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>Short ways to make the common ladder elements. Values in SI units (ohms, henries, farads, siemens).</summary>
public static class Elements
{
    /// <summary>A fixed impedance in series.</summary>
    public static SeriesElement SeriesImpedance(Complex ohms) => new(FixedImpedance.FromOhms(ohms));

    /// <summary>A fixed admittance in shunt.</summary>
    public static ShuntElement ShuntAdmittance(Complex siemens) => new(FixedImpedance.FromAdmittance(siemens));

    /// <summary>A resistor in series.</summary>
    public static SeriesElement SeriesResistor(double ohms) => new(new Resistor(ohms));

    /// <summary>A resistor in shunt.</summary>
    public static ShuntElement ShuntResistor(double ohms) => new(new Resistor(ohms));

    /// <summary>An ideal inductor in series.</summary>
    public static SeriesElement SeriesInductor(double henries) => new(Inductor.Ideal(henries));

    /// <summary>An ideal inductor in shunt.</summary>
    public static ShuntElement ShuntInductor(double henries) => new(Inductor.Ideal(henries));

    /// <summary>An ideal capacitor in series.</summary>
    public static SeriesElement SeriesCapacitor(double farads) => new(new Capacitor(farads));

    /// <summary>An ideal capacitor in shunt.</summary>
    public static ShuntElement ShuntCapacitor(double farads) => new(new Capacitor(farads));

    /// <summary>Any two-terminal part in series.</summary>
    public static SeriesElement Series(TwoTerminal part) => new(part);

    /// <summary>Any two-terminal part in shunt.</summary>
    public static ShuntElement Shunt(TwoTerminal part) => new(part);
}
