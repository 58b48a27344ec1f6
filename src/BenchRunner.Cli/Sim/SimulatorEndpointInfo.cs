using BenchRunner.Simulator.Endpoints;

namespace BenchRunner.Cli.Sim;

/// <summary>One served endpoint: which instrument, in which dialect, and the connection that reaches it.</summary>
public sealed record SimulatorEndpointInfo(SimulatedInstrument Instrument, SimulatorDialect Dialect, string Connection)
{
    /// <summary>The example driver profile that speaks to this endpoint.</summary>
    public string ExampleProfile =>
        $"docs/examples/profiles/bench-{VirtualBenchServers.NameOf(Instrument)}{(Dialect == SimulatorDialect.Scpi ? "-scpi" : "")}.yaml";
}
