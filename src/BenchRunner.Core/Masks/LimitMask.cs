using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Masks;

/// <summary>
/// A limit mask: an upper limit the level must stay at or below, a lower limit it must stay
/// at or above, or both, over the spans their corners cover. Immutable.
/// </summary>
/// <remarks>
/// A mask is checked at a trace's measured points only (see <see cref="Evaluate"/>); it says
/// nothing about the response between two points. The file form is read and written by
/// <see cref="MaskFile"/> and described in <c>docs/mask-format.md</c>.
/// </remarks>
public sealed class LimitMask
{
    /// <summary>Creates a mask.</summary>
    /// <param name="name">A short name, not blank.</param>
    /// <param name="upper">The upper limit, or null for none.</param>
    /// <param name="lower">The lower limit, or null for none.</param>
    /// <param name="unit">The unit of the traces the mask applies to: <see cref="TraceUnit.Decibel"/>
    /// (S-parameters) or <see cref="TraceUnit.DecibelMilliwatt"/> (power). For an absolute mask it
    /// is also the unit of the corner levels and is required unless <paramref name="parameter"/>
    /// implies it. For a relative-to-peak mask pass null: the corner levels are dB from the peak,
    /// the unit follows from <paramref name="parameter"/>, and without one the mask fits any trace.</param>
    /// <param name="reference">What the corner levels are measured from; default absolute.</param>
    /// <param name="interpolation">How limits run between corners; default linear.</param>
    /// <param name="parameter">The quantity the mask is meant for, or null for any of its unit.</param>
    /// <param name="description">Free text, or null.</param>
    /// <exception cref="ArgumentException">A blank name; neither limit; an absolute mask without a
    /// unit; a unit that contradicts the parameter; a relative mask given a unit without a
    /// parameter; log interpolation with a corner at 0 Hz.</exception>
    public LimitMask(
        string name,
        LimitLine? upper,
        LimitLine? lower,
        TraceUnit? unit,
        MaskReference reference = MaskReference.Absolute,
        MaskInterpolation interpolation = MaskInterpolation.Linear,
        TraceQuantity? parameter = null,
        string? description = null)
    {
        if (string.IsNullOrWhiteSpace(name))
        {
            throw new ArgumentException("A mask needs a name.", nameof(name));
        }

        if (upper is null && lower is null)
        {
            throw new ArgumentException($"The mask \"{name}\" has neither an upper nor a lower limit.", nameof(upper));
        }

        Name = name;
        Description = description;
        Upper = upper;
        Lower = lower;
        Reference = reference;
        Interpolation = interpolation;
        Parameter = parameter;
        Unit = ResolveUnit(unit, reference, parameter);
        CheckInterpolation(interpolation, upper, lower);
    }

    /// <summary>The mask's short name.</summary>
    public string Name { get; }

    /// <summary>Free text describing the mask, or null.</summary>
    public string? Description { get; }

    /// <summary>The quantity the mask is meant for (e.g. S21), or null when any trace of its unit fits.</summary>
    public TraceQuantity? Parameter { get; }

    /// <summary>How limits run between corners in frequency; the level is always linear in dB.</summary>
    public MaskInterpolation Interpolation { get; }

    /// <summary>What the corner levels are measured from.</summary>
    public MaskReference Reference { get; }

    /// <summary>
    /// The unit of the traces the mask applies to (for an absolute mask, also of its corner
    /// levels). Null only for a relative-to-peak mask without a parameter, which fits any trace.
    /// </summary>
    public TraceUnit? Unit { get; }

    /// <summary>The limit the level must stay at or below, or null.</summary>
    public LimitLine? Upper { get; }

    /// <summary>The limit the level must stay at or above, or null.</summary>
    public LimitLine? Lower { get; }

    /// <summary>
    /// The unit of the corner levels as written: <c>dBm</c> for an absolute power mask, <c>dB</c>
    /// otherwise (S-parameters, or offsets from the peak).
    /// </summary>
    public string LevelUnitSymbol =>
        Reference == MaskReference.Absolute && Unit == TraceUnit.DecibelMilliwatt ? "dBm" : "dB";

    /// <summary>
    /// Checks <paramref name="trace"/> against the mask at each measured point.
    /// </summary>
    /// <remarks>
    /// <list type="bullet">
    /// <item>Only measured points are checked; nothing is interpolated between them.</item>
    /// <item>A point outside every span the corners cover (or in a gap) is not checked.</item>
    /// <item>At a step's frequency, or where two sections touch, the stricter value applies.</item>
    /// <item>Margin, in dB, positive inside: upper limit − level, level − lower limit; where both
    /// limits apply, the smaller. A level exactly on the limit passes (margin 0).</item>
    /// <item>For a relative-to-peak mask the trace's highest sample level, over the whole trace,
    /// is added to every corner level.</item>
    /// </list>
    /// </remarks>
    /// <exception cref="ArgumentException">The trace is of another quantity than
    /// <see cref="Parameter"/>, or of another unit than <see cref="Unit"/> (a dBm mask on an
    /// S-parameter trace, or a dB mask on a power trace).</exception>
    public MaskEvaluation Evaluate(Trace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (Parameter is { } p && trace.Quantity != p)
        {
            throw new ArgumentException($"The mask \"{Name}\" applies to {Describe(p)}, but the trace is {Describe(trace.Quantity)}.", nameof(trace));
        }

        if (Unit is { } u && trace.Unit != u)
        {
            throw new ArgumentException(u == TraceUnit.DecibelMilliwatt
                ? $"The mask \"{Name}\" is for power traces in dBm, but the trace is {trace.Quantity} in dB."
                : $"The mask \"{Name}\" is for S-parameter traces in dB, but the trace is power in dBm.", nameof(trace));
        }

        return MaskEvaluator.Evaluate(this, trace);
    }

    /// <inheritdoc/>
    public override string ToString() => $"mask \"{Name}\"";

    private static string Describe(TraceQuantity quantity) => quantity == TraceQuantity.Power ? "power" : quantity.ToString();

    private static TraceUnit? ResolveUnit(TraceUnit? unit, MaskReference reference, TraceQuantity? parameter)
    {
        TraceUnit? implied = parameter switch
        {
            null => null,
            TraceQuantity.Power => TraceUnit.DecibelMilliwatt,
            _ => TraceUnit.Decibel,
        };

        if (unit is { } given && implied is { } fromParameter && given != fromParameter)
        {
            throw new ArgumentException($"The unit {given} does not fit the parameter {parameter}.", nameof(unit));
        }

        if (reference == MaskReference.RelativeToPeak && unit is not null && parameter is null)
        {
            throw new ArgumentException(
                "A relative-to-peak mask takes its unit from its parameter; pass a parameter or no unit.", nameof(unit));
        }

        var resolved = unit ?? implied;
        if (reference == MaskReference.Absolute && resolved is null)
        {
            throw new ArgumentException("An absolute mask needs a unit (dB or dBm) or a parameter that implies one.", nameof(unit));
        }

        return resolved;
    }

    private static void CheckInterpolation(MaskInterpolation interpolation, LimitLine? upper, LimitLine? lower)
    {
        if (interpolation != MaskInterpolation.Logarithmic)
        {
            return;
        }

        foreach (var line in new[] { upper, lower })
        {
            if (line is not null && line.Start.Hertz <= 0)
            {
                throw new ArgumentException("Log interpolation needs every corner above 0 Hz.", nameof(interpolation));
            }
        }
    }
}
