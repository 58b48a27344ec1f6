namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// Anything with two ports that a network analyser can measure: a circuit, an amplifier, an
/// open test port. Evaluating it must not allocate, so that a sweep costs only its result arrays.
/// </summary>
public interface ITwoPort
{
    /// <summary>The S-parameters at one frequency between real reference impedances at both ports.</summary>
    /// <param name="hertz">The frequency in hertz, finite and above zero.</param>
    /// <param name="referenceOhms">The reference impedance Z0 in ohms, finite and above zero.</param>
    /// <exception cref="ArgumentOutOfRangeException">The frequency or Z0 is not finite and positive.</exception>
    SParameters Evaluate(double hertz, double referenceOhms);
}
