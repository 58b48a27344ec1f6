namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// Whatever puts signals on a connector: a scene of received signals, a signal generator, or a
/// bench combining them. Read by the analyser once per sweep.
/// </summary>
public interface ISignalSource
{
    /// <summary>
    /// The emissions present now, as a consistent snapshot: may be called from another thread than
    /// the one changing the source's settings.
    /// </summary>
    IEnumerable<Emission> Emissions();
}
