using System.Collections.Immutable;
using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Circuits;

namespace BenchRunner.Simulator.Devices;

/// <summary>
/// The workshop's trimmer-tuned 137 MHz preselector: a three-resonator, top-capacitor-coupled
/// band-pass (centre 137.5 MHz, about 3.1 MHz wide at −3 dB, about 2.5 dB loss when tuned).
/// Port 1 — series end capacitor — [shunt resonator — series top capacitor] ×2 — shunt resonator —
/// series end capacitor — port 2. Each shunt resonator is a 47 nH coil (finite Q, self-capacitance)
/// in parallel with a 22 pF chip capacitor (ESR, ESL) and a trimmer (ESR, ESL). The same circuit
/// as scripts/make-example-traces.py, with the parasitics that the script leaves out; the coil Q
/// is chosen so that each resonator's Q, capacitor losses included, is the script's 300.
/// </summary>
public static class Preselector137
{
    /// <summary>The design centre, 137.5 MHz, at which the trimmers are aligned.</summary>
    public static Frequency DesignCentre { get; } = Frequency.FromMegahertz(137.5);

    /// <summary>The smallest capacitance a trimmer reaches (rotor fully out), in pF.</summary>
    public const double TrimmerMinimumPicofarads = 1.0;

    /// <summary>The largest capacitance a trimmer reaches (rotor fully in), in pF.</summary>
    public const double TrimmerMaximumPicofarads = 10.0;

    /// <summary>The system impedance the board is designed for, 50 Ω.</summary>
    public const double PortOhms = 50;

    /// <summary>
    /// How far each trimmer of the tuned example board PSF-24-0001 sits from its aligned setting,
    /// in pF (+0.02, −0.03, +0.01): the settings scripts/make-example-traces.py used.
    /// </summary>
    public static ImmutableArray<double> ExampleTuningOffsetsPicofarads { get; } = [0.02, -0.03, 0.01];

    /// <summary>How far the middle trimmer of the detuned example board PSF-24-0002 is set low, 0.77 pF.</summary>
    public const double ExampleDetuningPicofarads = 0.77;

    /// <summary>The design values of every part (the board as drawn).</summary>
    public static PreselectorParts NominalParts { get; } = new()
    {
        Input = NominalResonator,
        Middle = NominalResonator,
        Output = NominalResonator,
        InputCouplingFarads = 3.9e-12,
        InputTopFarads = 0.47e-12,
        OutputTopFarads = 0.47e-12,
        OutputCouplingFarads = 3.9e-12,
        CoilQFrequency = DesignCentre,
        TrimmerEsrOhms = 0.4,
        TrimmerEslHenries = 1.0e-9,
        ChipEsrOhms = 0.03,
        ChipEslHenries = 0.4e-9,
    };

    private static ResonatorParts NominalResonator => new(CoilHenries: 47e-9, CoilQ: 370, CoilSelfFarads: 0.25e-12, FixedFarads: 22e-12);

    /// <summary>The trimmer settings of the tuned example board: <see cref="Align"/>ed nominal parts plus <see cref="ExampleTuningOffsetsPicofarads"/> .</summary>
    public static TrimmerSettings TunedTrimmers
    {
        get
        {
            var aligned = Align(NominalParts);
            var o = ExampleTuningOffsetsPicofarads;
            return TrimmerSettings.FromPicofarads(aligned.InputPicofarads + o[0], aligned.MiddlePicofarads + o[1], aligned.OutputPicofarads + o[2]);
        }
    }

    /// <summary>The trimmer settings of the detuned example board: aligned, then the middle trimmer <see cref="ExampleDetuningPicofarads"/> low.</summary>
    public static TrimmerSettings DetunedTrimmers
    {
        get
        {
            var aligned = Align(NominalParts);
            return aligned.With(1, aligned.MiddlePicofarads - ExampleDetuningPicofarads);
        }
    }

    /// <summary>A board with nominal parts, tuned like the example PSF-24-0001.</summary>
    public static PreselectorBoard TunedBoard(string serial = "PSF-24-0001") => new(serial, NominalParts, TunedTrimmers);

    /// <summary>A board with nominal parts and the middle trimmer mis-set like the example PSF-24-0002.</summary>
    public static PreselectorBoard DetunedBoard(string serial = "PSF-24-0002") => new(serial, NominalParts, DetunedTrimmers);

    /// <summary>The circuit of a board with the given parts and trimmer settings.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A part value out of range.</exception>
    public static Network BuildNetwork(PreselectorParts parts, TrimmerSettings trimmers)
    {
        ArgumentNullException.ThrowIfNull(parts);
        return new Network(
            Elements.Series(Chip(parts, parts.InputCouplingFarads)),
            Elements.Shunt(ResonatorOf(parts, 0, trimmers.InputPicofarads)),
            Elements.Series(Chip(parts, parts.InputTopFarads)),
            Elements.Shunt(ResonatorOf(parts, 1, trimmers.MiddlePicofarads)),
            Elements.Series(Chip(parts, parts.OutputTopFarads)),
            Elements.Shunt(ResonatorOf(parts, 2, trimmers.OutputPicofarads)),
            Elements.Series(Chip(parts, parts.OutputCouplingFarads)));
    }

    /// <summary>
    /// The trimmer settings an ideal alignment gives: each trimmer set so that its resonator, with
    /// the neighbouring resonators shorted to ground and the ports terminated in 50 Ω, has zero
    /// susceptance at <paramref name="centre"/> (the one-resonator-at-a-time alignment of coupled-
    /// resonator filters; the rule scripts/make-example-traces.py uses). A setting that would need
    /// more or less than the trimmer reaches stays at the end of its travel.
    /// </summary>
    /// <param name="parts">The board's parts.</param>
    /// <param name="centre">The alignment frequency; <see cref="DesignCentre"/> when null.</param>
    public static TrimmerSettings Align(PreselectorParts parts, Frequency? centre = null)
    {
        ArgumentNullException.ThrowIfNull(parts);
        double hz = (centre ?? DesignCentre).Hertz;
        return TrimmerSettings.FromPicofarads(AlignOne(parts, 0, hz), AlignOne(parts, 1, hz), AlignOne(parts, 2, hz));
    }

    /// <summary>True when every trimmer lies within its travel.</summary>
    public static bool WithinTravel(TrimmerSettings trimmers) =>
        Enumerable.Range(0, 3).All(i => trimmers[i] is >= TrimmerMinimumPicofarads and <= TrimmerMaximumPicofarads);

    private static double AlignOne(PreselectorParts parts, int position, double hz)
    {
        double Susceptance(double trimmerPf) => NodeAdmittance(parts, position, trimmerPf, hz).Imaginary;

        double lo = TrimmerMinimumPicofarads, hi = TrimmerMaximumPicofarads;
        if (Susceptance(lo) >= 0)
        {
            return lo;
        }

        if (Susceptance(hi) <= 0)
        {
            return hi;
        }

        // The susceptance rises steadily with the trimmer's capacitance: bisect to far below a femtofarad.
        for (int i = 0; i < 60; i++)
        {
            double mid = (lo + hi) / 2;
            if (Susceptance(mid) < 0)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return (lo + hi) / 2;
    }

    private static Complex NodeAdmittance(PreselectorParts parts, int position, double trimmerPf, double hz)
    {
        var y = ResonatorOf(parts, position, trimmerPf).AdmittanceAt(hz);
        var port = new Complex(PortOhms, 0);
        y += position switch
        {
            0 => 1 / (Chip(parts, parts.InputCouplingFarads).ImpedanceAt(hz) + port) + Chip(parts, parts.InputTopFarads).AdmittanceAt(hz),
            1 => Chip(parts, parts.InputTopFarads).AdmittanceAt(hz) + Chip(parts, parts.OutputTopFarads).AdmittanceAt(hz),
            _ => Chip(parts, parts.OutputTopFarads).AdmittanceAt(hz) + 1 / (Chip(parts, parts.OutputCouplingFarads).ImpedanceAt(hz) + port),
        };
        return y;
    }

    private static TwoTerminal ResonatorOf(PreselectorParts parts, int position, double trimmerPicofarads)
    {
        var r = parts.Resonator(position);
        return new ParallelCombination(
            Inductor.WithQAt(r.CoilHenries, r.CoilQ, parts.CoilQFrequency, r.CoilSelfFarads),
            Chip(parts, r.FixedFarads),
            new Capacitor(trimmerPicofarads * 1e-12, parts.TrimmerEsrOhms, parts.TrimmerEslHenries));
    }

    private static Capacitor Chip(PreselectorParts parts, double farads) => new(farads, parts.ChipEsrOhms, parts.ChipEslHenries);
}
