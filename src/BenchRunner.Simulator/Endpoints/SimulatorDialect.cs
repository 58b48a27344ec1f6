namespace BenchRunner.Simulator.Endpoints;

/// <summary>Which language a simulated instrument speaks on an endpoint.</summary>
public enum SimulatorDialect
{
    /// <summary>SCPI-1999 / IEEE 488.2 (docs/simulator-protocols.md).</summary>
    Scpi,

    /// <summary>The project's own raw line dialect (docs/simulator-dialect.md).</summary>
    Raw,
}
