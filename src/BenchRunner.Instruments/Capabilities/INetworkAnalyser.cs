using BenchRunner.Core.Traces;

namespace BenchRunner.Instruments.Capabilities;

/// <summary>A vector network analyser: sweeps and returns S-parameters as complex traces.</summary>
public interface INetworkAnalyser
{
    /// <summary>Sets the sweep. Later acquisitions use it.</summary>
    Task ConfigureSweepAsync(NetworkSweep sweep, CancellationToken cancellationToken);

    /// <summary>Sweeps once and returns one trace per requested parameter, in the order asked.</summary>
    /// <exception cref="Errors.InstrumentException">The sweep failed or the data could not be read.</exception>
    Task<IReadOnlyList<ComplexTrace>> AcquireAsync(IReadOnlyList<TraceQuantity> parameters, CancellationToken cancellationToken);
}
