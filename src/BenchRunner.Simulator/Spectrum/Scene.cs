using System.Collections.Immutable;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>
/// Invented signals arriving at the analyser's input from outside the bench (an antenna, a
/// coupler): CW and FM carriers with their levels as measured at the input. Immutable.
/// </summary>
public sealed class Scene : ISignalSource
{
    /// <summary>Creates a scene of <paramref name="signals"/>.</summary>
    public Scene(IEnumerable<SceneSignal> signals)
    {
        ArgumentNullException.ThrowIfNull(signals);
        Signals = [.. signals];
    }

    /// <summary>A scene without signals: only the analyser's own noise is seen.</summary>
    public static Scene Empty { get; } = new([]);

    /// <summary>The signals, in the order given.</summary>
    public ImmutableArray<SceneSignal> Signals { get; }

    /// <summary>This scene with one more signal.</summary>
    public Scene With(string name, Emission emission) => new(Signals.Add(new SceneSignal(name, emission)));

    /// <inheritdoc/>
    public IEnumerable<Emission> Emissions() => Signals.Select(s => s.Emission);
}
