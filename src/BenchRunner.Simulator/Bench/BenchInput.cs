using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Bench;

/// <summary>
/// What reaches the bench analyser's input: the scene as it arrives, plus the generator's output
/// (carrier and harmonics) after the path, each at its own frequency. Reads the bench's current
/// scene, path and generator state on every call.
/// </summary>
internal sealed class BenchInput(VirtualBench bench) : ISignalSource
{
    public IEnumerable<Emission> Emissions()
    {
        var path = bench.Path;
        foreach (var emission in bench.Scene.Emissions())
        {
            yield return emission;
        }

        foreach (var emission in bench.Generator.Emissions())
        {
            yield return emission.WithLevel(path.Output(emission.Centre, emission.Level));
        }
    }
}
