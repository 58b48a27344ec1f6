using System.Text.Json.Nodes;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.RfMath;
using BenchRunner.Core.Validity;

namespace BenchRunner.Execution.Bench;

/// <summary>
/// What lies between a probed point and a spectrum analyser's input, as the bench file's
/// <c>compensation</c> section declares it: a series-resistor probe, fixed attenuators, a DC
/// block and a cable with a loss table. Spectrum traces of that analyser are referred back to the
/// probed point by adding these losses.
/// </summary>
/// <param name="Role">The spectrum analyser whose input the path feeds.</param>
/// <param name="ProbeResistor">The probe's series resistor, or null when no probe is used.</param>
/// <param name="InputImpedance">The analyser input's impedance the probe works into (50 Ω unless declared).</param>
/// <param name="Attenuators">The fixed attenuators, each a positive loss.</param>
/// <param name="DcBlock">The DC block's insertion loss, or null when there is none.</param>
/// <param name="CablePoints">The cable's loss table (frequency, positive loss), empty when no cable is declared.</param>
/// <param name="Location">Where it is declared in the bench file.</param>
public sealed record InputCompensation(
    string Role,
    Resistance? ProbeResistor,
    Resistance InputImpedance,
    IReadOnlyList<Ratio> Attenuators,
    Ratio? DcBlock,
    IReadOnlyList<(Frequency Frequency, Ratio Loss)> CablePoints,
    SourceLocation Location)
{
    /// <summary>The losses as Core applies them to traces.</summary>
    public PathCompensation Path { get; } = Build(ProbeResistor, InputImpedance, Attenuators, DcBlock, CablePoints);

    /// <summary>True when a series-resistor probe is declared: the analyser looks into a working circuit.</summary>
    public bool HasProbe => ProbeResistor is not null;

    /// <summary>
    /// The smallest loss the path can have at any frequency: the fixed losses plus the cable's
    /// lowest table entry (linear interpolation never goes below it). The safety interlock uses it,
    /// so that the level it expects at the analyser is never too low.
    /// </summary>
    public Ratio LeastLoss => Path.FixedLoss + Ratio.FromDecibels(CablePoints.Count == 0 ? 0 : CablePoints.Min(p => p.Loss.Decibels));

    /// <summary>One line naming what is compensated, as stored with every sweep (<see cref="PathCompensation.Description"/>).</summary>
    public string Description => Path.Description;

    /// <summary>The compensation as a JSON document, stored with the analyser's instrument record.</summary>
    public string ToJson()
    {
        var document = new JsonObject
        {
            ["description"] = Description,
            ["fixed_loss_db"] = Path.FixedLoss.Decibels,
            ["least_loss_db"] = LeastLoss.Decibels,
        };
        if (ProbeResistor is { } r)
        {
            document["probe"] = new JsonObject
            {
                ["series_ohms"] = r.Ohms,
                ["input_ohms"] = InputImpedance.Ohms,
                ["loss_db"] = ProbeLoss.LossOf(r, InputImpedance).Decibels,
            };
        }

        document["attenuators_db"] = new JsonArray([.. Attenuators.Select(a => (JsonNode?)a.Decibels)]);
        if (DcBlock is { } block)
        {
            document["dc_block_db"] = block.Decibels;
        }

        document["cable"] = new JsonArray([.. CablePoints.Select(p => (JsonNode?)new JsonObject
        {
            ["frequency_hz"] = p.Frequency.Hertz,
            ["loss_db"] = p.Loss.Decibels,
        })]);
        return document.ToJsonString();
    }

    private static PathCompensation Build(Resistance? probe, Resistance impedance, IReadOnlyList<Ratio> attenuators, Ratio? dcBlock,
        IReadOnlyList<(Frequency Frequency, Ratio Loss)> cable)
    {
        var path = PathCompensation.None;
        if (probe is { } r)
        {
            path = path.WithProbe(r, impedance);
        }

        foreach (var attenuator in attenuators)
        {
            path = path.WithAttenuator(attenuator);
        }

        if (dcBlock is { } block)
        {
            path = path.WithDcBlock(block);
        }

        if (cable.Count > 0)
        {
            var table = CableLossTable.Create(cable);
            path = path.WithCable(table.Success ? table.Value : throw new ArgumentException(table.Error, nameof(cable)));
        }

        return path;
    }
}
