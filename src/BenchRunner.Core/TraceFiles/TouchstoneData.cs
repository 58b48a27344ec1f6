using System.Collections.Immutable;
using System.Numerics;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.TraceFiles;

/// <summary>
/// The network data of a Touchstone file, immutable, held as S-parameters whatever parameter
/// type the file used (Y and Z data are converted on reading; see <see cref="TouchstoneReader"/>).
/// </summary>
public sealed class TouchstoneData
{
    private readonly ImmutableArray<Complex> _scattering;

    /// <summary>Creates network data from S-parameters.</summary>
    /// <param name="axis">The frequency points.</param>
    /// <param name="portCount">The number of ports, at least 1.</param>
    /// <param name="scattering">
    /// The S-parameters, linear and unitless: point by point, each point's matrix row by row
    /// (S11, S12, ..., S21, S22, ...), so <c>axis.Count × portCount²</c> values.
    /// </param>
    /// <param name="referenceOhms">The reference resistance of each port in ohms (positive), or one value for all ports.</param>
    /// <param name="version">The Touchstone version the data came from or is meant for: 1 or 2.</param>
    /// <param name="parameter">The parameter type the file held before conversion to S.</param>
    /// <param name="comments">Comment lines of the file, without the leading <c>!</c>.</param>
    /// <exception cref="ArgumentException">A count mismatch, a non-finite value, a bad reference or version.</exception>
    public TouchstoneData(
        FrequencyAxis axis,
        int portCount,
        IEnumerable<Complex> scattering,
        IEnumerable<double> referenceOhms,
        int version = 1,
        TouchstoneParameter parameter = TouchstoneParameter.S,
        IEnumerable<string>? comments = null)
    {
        ArgumentNullException.ThrowIfNull(axis);
        ArgumentNullException.ThrowIfNull(scattering);
        ArgumentNullException.ThrowIfNull(referenceOhms);
        ArgumentOutOfRangeException.ThrowIfLessThan(portCount, 1);
        if (version is not (1 or 2))
        {
            throw new ArgumentOutOfRangeException(nameof(version), version, "The Touchstone version must be 1 or 2.");
        }

        var values = scattering.ToImmutableArray();
        if (values.Length != axis.Count * portCount * portCount)
        {
            throw new ArgumentException(
                $"{axis.Count} points of {portCount} port(s) need {axis.Count * portCount * portCount} values, got {values.Length}.",
                nameof(scattering));
        }

        for (int i = 0; i < values.Length; i++)
        {
            if (!double.IsFinite(values[i].Real) || !double.IsFinite(values[i].Imaginary))
            {
                throw new ArgumentException($"Value {i} ({values[i]}) is not finite.", nameof(scattering));
            }
        }

        var references = referenceOhms.ToImmutableArray();
        if (references.Length == 1 && portCount > 1)
        {
            references = Enumerable.Repeat(references[0], portCount).ToImmutableArray();
        }

        if (references.Length != portCount)
        {
            throw new ArgumentException($"{portCount} port(s) need {portCount} reference resistances, got {references.Length}.", nameof(referenceOhms));
        }

        if (references.Any(r => !double.IsFinite(r) || r <= 0))
        {
            throw new ArgumentException("Reference resistances must be finite and positive.", nameof(referenceOhms));
        }

        Axis = axis;
        PortCount = portCount;
        _scattering = values;
        ReferenceOhms = references;
        Version = version;
        Parameter = parameter;
        Comments = comments?.ToImmutableArray() ?? [];
    }

    /// <summary>The Touchstone version: 1 (1.0/1.1 syntax) or 2 (2.0 keywords).</summary>
    public int Version { get; }

    /// <summary>The number of ports.</summary>
    public int PortCount { get; }

    /// <summary>The frequency points.</summary>
    public FrequencyAxis Axis { get; }

    /// <summary>The reference resistance of each port in ohms.</summary>
    public ImmutableArray<double> ReferenceOhms { get; }

    /// <summary>True when every port has the same reference resistance.</summary>
    public bool HasUniformReference => ReferenceOhms.All(r => r == ReferenceOhms[0]);

    /// <summary>The parameter type as read from the file; the data held here are always S-parameters.</summary>
    public TouchstoneParameter Parameter { get; }

    /// <summary>The file's comment lines, without the leading <c>!</c>.</summary>
    public ImmutableArray<string> Comments { get; }

    /// <summary>S-parameter <c>S(row+1)(col+1)</c> at point <paramref name="point"/>; all indices 0-based.</summary>
    /// <exception cref="ArgumentOutOfRangeException">An index out of range.</exception>
    public Complex Get(int point, int row, int col)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(point);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(point, Axis.Count);
        ArgumentOutOfRangeException.ThrowIfNegative(row);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(row, PortCount);
        ArgumentOutOfRangeException.ThrowIfNegative(col);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(col, PortCount);
        return _scattering[(point * PortCount + row) * PortCount + col];
    }

    /// <summary>One S-parameter over all points: S11, S21, S12 or S22 (ports 1 and 2).</summary>
    /// <exception cref="ArgumentException"><see cref="TraceQuantity.Power"/>, or a port the data do not have.</exception>
    public ComplexTrace Trace(TraceQuantity quantity)
    {
        var (row, col) = Indices(quantity);
        if (row >= PortCount || col >= PortCount)
        {
            throw new ArgumentException($"{quantity} needs 2 ports; the data have {PortCount}.", nameof(quantity));
        }

        return new ComplexTrace(Axis, quantity, Enumerable.Range(0, Axis.Count).Select(p => Get(p, row, col)));
    }

    /// <summary>
    /// The data as a trace set: S11 for one port; S11, S21, S12 and S22 for two ports.
    /// </summary>
    /// <exception cref="InvalidOperationException">More than two ports, or ports with different references.</exception>
    public TraceSet ToTraceSet()
    {
        if (PortCount > 2)
        {
            throw new InvalidOperationException($"A trace set holds 1- or 2-port data; these data have {PortCount} ports.");
        }

        if (!HasUniformReference)
        {
            throw new InvalidOperationException(
                $"A trace set has one reference impedance; these ports have {string.Join(", ", ReferenceOhms.Select(TraceFileText.Format))} ohms.");
        }

        TraceQuantity[] quantities = PortCount == 1
            ? [TraceQuantity.S11]
            : [TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22];
        return new TraceSet(Axis, quantities.Select(Trace), ReferenceOhms[0]);
    }

    /// <summary>
    /// Network data from a trace set holding S11 alone (one port) or S11, S21, S12 and S22 (two ports).
    /// </summary>
    /// <param name="set">The traces.</param>
    /// <param name="version">The Touchstone version to record: 1 or 2.</param>
    /// <exception cref="ArgumentException">A power trace, or S-parameters that do not make a full 1- or 2-port matrix.</exception>
    public static TouchstoneData FromTraceSet(TraceSet set, int version = 1)
    {
        ArgumentNullException.ThrowIfNull(set);
        if (set.Traces.Any(t => t is not ComplexTrace))
        {
            throw new ArgumentException("A Touchstone file holds S-parameters only; the set has a power trace.", nameof(set));
        }

        var present = set.Traces.Select(t => t.Quantity).ToHashSet();
        TraceQuantity[] twoPort = [TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22];
        int ports;
        if (present.SetEquals([TraceQuantity.S11]))
        {
            ports = 1;
        }
        else if (present.SetEquals(twoPort))
        {
            ports = 2;
        }
        else
        {
            var missing = twoPort.Where(q => !present.Contains(q));
            throw new ArgumentException(
                "A Touchstone file needs S11 alone (1 port) or S11, S21, S12 and S22 (2 ports); the set lacks "
                + string.Join(", ", missing) + ".",
                nameof(set));
        }

        var samples = new Dictionary<(int, int), ImmutableArray<Complex>>();
        foreach (var trace in set.Traces.Cast<ComplexTrace>())
        {
            samples[Indices(trace.Quantity)] = trace.Samples;
        }

        var values = new List<Complex>(set.Axis.Count * ports * ports);
        for (int p = 0; p < set.Axis.Count; p++)
        {
            for (int row = 0; row < ports; row++)
            {
                for (int col = 0; col < ports; col++)
                {
                    values.Add(samples[(row, col)][p]);
                }
            }
        }

        return new TouchstoneData(set.Axis, ports, values, [set.ReferenceOhms], version);
    }

    private static (int Row, int Col) Indices(TraceQuantity quantity) => quantity switch
    {
        TraceQuantity.S11 => (0, 0),
        TraceQuantity.S21 => (1, 0),
        TraceQuantity.S12 => (0, 1),
        TraceQuantity.S22 => (1, 1),
        _ => throw new ArgumentException($"{quantity} is not an S-parameter.", nameof(quantity)),
    };
}
