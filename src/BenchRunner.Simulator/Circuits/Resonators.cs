namespace BenchRunner.Simulator.Circuits;

/// <summary>LC resonators as two-terminal parts.</summary>
public static class Resonators
{
    /// <summary>
    /// L, C and a loss resistance in series: Z = R + j(ωL − 1/(ωC)), zero reactance at
    /// 1/(2π·√(LC)). Put in series it passes its resonance; put in shunt it is a trap.
    /// </summary>
    /// <param name="henries">L in henries, above zero.</param>
    /// <param name="farads">C in farads, above zero.</param>
    /// <param name="lossOhms">The series resistance in ohms, not negative; 0 by default.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    public static TwoTerminal SeriesLc(double henries, double farads, double lossOhms = 0) =>
        new SeriesCombination(Inductor.Ideal(henries), new Capacitor(farads), new Resistor(lossOhms));

    /// <summary>
    /// L, C and optionally a loss resistance in parallel: Y = 1/R + j(ωC − 1/(ωL)), infinite
    /// impedance at 1/(2π·√(LC)) when lossless. Put in shunt it passes its resonance (a tank);
    /// put in series it is a trap.
    /// </summary>
    /// <param name="henries">L in henries, above zero.</param>
    /// <param name="farads">C in farads, above zero.</param>
    /// <param name="lossOhms">The parallel resistance in ohms, above zero; none (lossless) when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of its range.</exception>
    public static TwoTerminal ParallelLc(double henries, double farads, double? lossOhms = null) =>
        lossOhms is { } r
            ? new ParallelCombination(Inductor.Ideal(henries), new Capacitor(farads), new Resistor(Require.Positive(r, nameof(lossOhms))))
            : new ParallelCombination(Inductor.Ideal(henries), new Capacitor(farads));
}
