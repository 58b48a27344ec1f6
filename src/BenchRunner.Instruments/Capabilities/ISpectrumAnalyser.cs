using BenchRunner.Core.Traces;

namespace BenchRunner.Instruments.Capabilities;

/// <summary>A spectrum analyser: sweeps and returns a power trace in dBm.</summary>
public interface ISpectrumAnalyser
{
    /// <summary>Applies the settings. Later acquisitions use them.</summary>
    Task ConfigureAsync(SpectrumSettings settings, CancellationToken cancellationToken);

    /// <summary>Sweeps once and returns the power trace.</summary>
    /// <exception cref="Errors.InstrumentException">The sweep failed or the data could not be read.</exception>
    Task<PowerTrace> AcquireAsync(CancellationToken cancellationToken);
}
