using System.Reflection;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Simulator.Bench;

/// <summary>The identity every simulated instrument reports: maker BenchRunner, its model, a serial, and the simulator's version as firmware.</summary>
internal static class SimulatorIdentity
{
    public const string Maker = "BenchRunner";

    public static InstrumentIdentity Create(string model, string serial)
    {
        var version = typeof(SimulatorIdentity).Assembly.GetName().Version;
        return new InstrumentIdentity(Maker, model, serial, version is null ? "0" : version.ToString(3));
    }
}
