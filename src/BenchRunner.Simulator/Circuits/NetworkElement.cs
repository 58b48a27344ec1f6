namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// One two-port link of a <see cref="Network"/>'s chain, described by its ABCD matrix against
/// frequency. Implementations are immutable and do not allocate when evaluated.
/// </summary>
public abstract class NetworkElement
{
    /// <summary>The ABCD matrix at <paramref name="hertz"/> (above zero).</summary>
    public abstract Abcd AbcdAt(double hertz);
}
