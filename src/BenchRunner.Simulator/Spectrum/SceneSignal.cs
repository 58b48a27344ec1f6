namespace BenchRunner.Simulator.Spectrum;

/// <summary>A named signal of a scene.</summary>
public sealed record SceneSignal
{
    /// <summary>Creates a named signal.</summary>
    /// <exception cref="ArgumentException">The name is empty.</exception>
    public SceneSignal(string name, Emission emission)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentNullException.ThrowIfNull(emission);
        Name = name;
        Emission = emission;
    }

    /// <summary>What the signal is called in descriptions and logs, e.g. <c>downlink</c>.</summary>
    public string Name { get; }

    /// <summary>The signal as it arrives at the analyser's input.</summary>
    public Emission Emission { get; }
}
