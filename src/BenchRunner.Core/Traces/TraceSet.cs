namespace BenchRunner.Core.Traces;

/// <summary>
/// Traces measured together on one frequency axis, as read from a trace file
/// (for example S11, S21, S12 and S22 of a two-port), with the reference impedance.
/// </summary>
public sealed class TraceSet
{
    /// <summary>Creates a set; every trace must share <paramref name="axis"/>'s points.</summary>
    /// <exception cref="ArgumentException">A trace on other points, or a quantity given twice.</exception>
    public TraceSet(FrequencyAxis axis, IEnumerable<Trace> traces, double referenceOhms = 50)
    {
        ArgumentNullException.ThrowIfNull(axis);
        if (!double.IsFinite(referenceOhms) || referenceOhms <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(referenceOhms), referenceOhms, "The reference impedance must be positive.");
        }

        var list = traces.ToList();
        foreach (var t in list)
        {
            if (!t.Axis.SamePointsAs(axis))
            {
                throw new ArgumentException($"Trace {t.Quantity} is not on the set's frequency points.", nameof(traces));
            }
        }

        var duplicate = list.GroupBy(t => t.Quantity).FirstOrDefault(g => g.Count() > 1);
        if (duplicate is not null)
        {
            throw new ArgumentException($"{duplicate.Key} is given more than once.", nameof(traces));
        }

        Axis = axis;
        Traces = list;
        ReferenceOhms = referenceOhms;
    }

    /// <summary>The frequency points shared by all traces.</summary>
    public FrequencyAxis Axis { get; }

    /// <summary>The traces, in file order.</summary>
    public IReadOnlyList<Trace> Traces { get; }

    /// <summary>The reference impedance in ohms (50 unless the file says otherwise).</summary>
    public double ReferenceOhms { get; }

    /// <summary>The trace of <paramref name="quantity"/>, or null when the set has none.</summary>
    public Trace? Find(TraceQuantity quantity) => Traces.FirstOrDefault(t => t.Quantity == quantity);
}
