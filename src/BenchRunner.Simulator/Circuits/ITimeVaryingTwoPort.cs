namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// A two-port whose response changes while it sits on the bench (a board being tuned). A network
/// analyser takes one <see cref="Snapshot"/> at the start of each sweep, so that every point of
/// one sweep sees the same state, as it would with a sweep much faster than a hand on a trimmer.
/// </summary>
public interface ITimeVaryingTwoPort : ITwoPort
{
    /// <summary>The response as it is now; the returned two-port no longer changes.</summary>
    ITwoPort Snapshot();
}
