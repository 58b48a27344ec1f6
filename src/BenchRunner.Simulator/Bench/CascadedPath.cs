using System.Collections.Immutable;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Bench;

/// <summary>Paths one after another: the output of each is the input of the next, so gains in dB add (and each stage compresses on its own input level).</summary>
public sealed class CascadedPath : IRfPath
{
    /// <summary>Creates the cascade of <paramref name="stages"/>, first to last.</summary>
    /// <exception cref="ArgumentException">No stages.</exception>
    public CascadedPath(IEnumerable<IRfPath> stages)
    {
        ArgumentNullException.ThrowIfNull(stages);
        Stages = [.. stages];
        if (Stages.IsEmpty)
        {
            throw new ArgumentException("A cascade needs at least one stage.", nameof(stages));
        }

        if (Stages.Any(s => s is null))
        {
            throw new ArgumentException("A cascade's stages must not be null.", nameof(stages));
        }
    }

    /// <summary>The stages, from the generator side to the analyser side.</summary>
    public ImmutableArray<IRfPath> Stages { get; }

    /// <inheritdoc/>
    public Level Output(Frequency frequency, Level input)
    {
        var level = input;
        foreach (var stage in Stages)
        {
            level = stage.Output(frequency, level);
        }

        return level;
    }
}
