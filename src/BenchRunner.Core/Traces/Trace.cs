using System.Collections.Immutable;

namespace BenchRunner.Core.Traces;

/// <summary>
/// One measured quantity over a <see cref="FrequencyAxis"/>. Immutable.
/// Every trace has a real level per point in decibels (<see cref="LevelsDb"/>), which is what
/// figures and limit masks work on; S-parameter traces also keep their complex samples.
/// </summary>
public abstract class Trace
{
    private protected Trace(FrequencyAxis axis, TraceQuantity quantity, ImmutableArray<double> levelsDb)
    {
        ArgumentNullException.ThrowIfNull(axis);
        if (levelsDb.Length != axis.Count)
        {
            throw new ArgumentException($"The trace has {levelsDb.Length} samples but its axis has {axis.Count} points.");
        }

        Axis = axis;
        Quantity = quantity;
        LevelsDb = levelsDb;
    }

    /// <summary>The frequencies of the samples.</summary>
    public FrequencyAxis Axis { get; }

    /// <summary>What the trace measures.</summary>
    public TraceQuantity Quantity { get; }

    /// <summary>The unit of <see cref="LevelsDb"/>.</summary>
    public abstract TraceUnit Unit { get; }

    /// <summary>The level of each point in dB (S-parameters) or dBm (power), finite.</summary>
    public ImmutableArray<double> LevelsDb { get; }

    /// <summary>The number of points.</summary>
    public int Count => Axis.Count;

    /// <summary>A short name for the unit: <c>dB</c> or <c>dBm</c>.</summary>
    public string UnitSymbol => Unit == TraceUnit.Decibel ? "dB" : "dBm";
}
