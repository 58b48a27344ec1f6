using System.Globalization;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Validity;

/// <summary>
/// The losses between a probed point and the analyser's input: a series-resistor probe, fixed
/// attenuators, a DC block and a cable, all as positive dB losses that add. Immutable; each
/// <c>With</c> method returns a new compensation with one more element.
/// </summary>
public sealed class PathCompensation
{
    private readonly double _fixedDb;
    private readonly CableLossTable? _cable;
    private readonly IReadOnlyList<string> _parts;

    private PathCompensation(double fixedDb, CableLossTable? cable, IReadOnlyList<string> parts)
    {
        _fixedDb = fixedDb;
        _cable = cable;
        _parts = parts;
    }

    /// <summary>No compensation: 0 dB everywhere.</summary>
    public static PathCompensation None { get; } = new(0, null, []);

    /// <summary>The frequency-independent part: probe, attenuators and DC block, in dB.</summary>
    public Ratio FixedLoss => Ratio.FromDecibels(_fixedDb);

    /// <summary>
    /// One line naming what is compensated, to be stored with results, e.g.
    /// "compensated: probe 4.7 kOhm into 50 Ohm (39.554 dB) + attenuator 10 dB + cable table 10 MHz to 1 GHz (3 points)";
    /// "no path compensation" for <see cref="None"/>.
    /// </summary>
    public string Description => _parts.Count == 0 ? "no path compensation" : "compensated: " + string.Join(" + ", _parts);

    /// <summary>Adds a series-resistor probe: loss 20·log10((R + Z0)/Z0) (<see cref="ProbeLoss.LossOf"/>).</summary>
    /// <param name="seriesResistance">The probe's series resistor.</param>
    /// <param name="systemImpedance">The analyser's input impedance; 50 Ω when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">Z0 is zero.</exception>
    public PathCompensation WithProbe(Resistance seriesResistance, Resistance? systemImpedance = null)
    {
        var loss = ProbeLoss.LossOf(seriesResistance, systemImpedance);
        var z0 = systemImpedance ?? Resistance.FromOhms(50);
        return Add(loss.Decibels, string.Create(CultureInfo.InvariantCulture, $"probe {seriesResistance} into {z0} ({loss.Decibels:0.###} dB)"));
    }

    /// <summary>Adds a fixed attenuator.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A negative loss (a gain is no attenuator).</exception>
    public PathCompensation WithAttenuator(Ratio loss) => Add(NonNegative(loss, nameof(loss)), $"attenuator {loss}");

    /// <summary>Adds a DC block with its insertion loss; 0 dB when not given.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A negative insertion loss.</exception>
    public PathCompensation WithDcBlock(Ratio insertionLoss = default) =>
        Add(NonNegative(insertionLoss, nameof(insertionLoss)), $"DC block {insertionLoss}");

    /// <summary>Sets the cable's loss table (replacing any earlier one).</summary>
    public PathCompensation WithCable(CableLossTable cable)
    {
        ArgumentNullException.ThrowIfNull(cable);
        return new PathCompensation(_fixedDb, cable, [.. _parts.Where(p => !p.StartsWith("cable", StringComparison.Ordinal)), cable.ToString()]);
    }

    /// <summary>The total loss at <paramref name="frequency"/>, in positive dB.</summary>
    /// <returns>Unavailable when the frequency is outside the cable table.</returns>
    public FigureResult<Ratio> LossAt(Frequency frequency)
    {
        var fixedLoss = FixedLoss;
        return _cable is null ? FigureResult<Ratio>.Available(fixedLoss) : _cable.LossAt(frequency).Select(c => c + fixedLoss);
    }

    /// <summary>The trace referred to the probed point: every level plus the loss at its frequency.</summary>
    /// <returns>Unavailable when any point lies outside the cable table; the reason names the first.</returns>
    public FigureResult<PowerTrace> Apply(PowerTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        var levels = new double[trace.Count];
        for (int i = 0; i < levels.Length; i++)
        {
            var loss = LossAt(trace.Axis[i]);
            if (!loss.IsAvailable)
            {
                return FigureResult<PowerTrace>.Unavailable(loss.Reason!);
            }

            levels[i] = trace.LevelsDb[i] + loss.Value.Decibels;
        }

        return FigureResult<PowerTrace>.Available(new PowerTrace(trace.Axis, levels));
    }

    private PathCompensation Add(double db, string part) => new(_fixedDb + db, _cable, [.. _parts, part]);

    private static double NonNegative(Ratio loss, string name) =>
        loss.Decibels >= 0 ? loss.Decibels : throw new ArgumentOutOfRangeException(name, loss.Decibels, "A loss must be 0 dB or more.");
}
