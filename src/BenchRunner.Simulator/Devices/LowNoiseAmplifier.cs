using System.Numerics;
using BenchRunner.Core.RfMath;
using BenchRunner.Simulator.Circuits;

namespace BenchRunner.Simulator.Devices;

/// <summary>
/// The workshop's ~20 dB LNA as a two-port for the network analyser. S21 comes from its
/// <see cref="AmplifierModel"/>. The input looks like 75 Ω in series with an LC resonant at the
/// model's centre (100 nH), the output like 34 Ω with an LC resonant at 138 MHz (75 nH), giving
/// about 13–15 dB of return loss across 130–145 MHz. Reverse isolation comes from a feedback
/// capacitance: S12 is −35 dB at the centre, rising 6 dB per octave.
/// </summary>
public sealed class LowNoiseAmplifier : ITwoPort
{
    private const double ModelOhms = 50;
    private const double InputOhms = 75, InputHenries = 100e-9;
    private const double OutputOhms = 34, OutputHenries = 75e-9, OutputResonanceHertz = 138e6;
    private const double IsolationDbAtCentre = -35;

    private readonly double _inputFarads;
    private readonly double _outputFarads;

    /// <summary>Creates the amplifier.</summary>
    /// <param name="model">Its gain, noise and compression; <see cref="AmplifierModel.Lna137"/> when null.</param>
    public LowNoiseAmplifier(AmplifierModel? model = null)
    {
        Model = model ?? AmplifierModel.Lna137;
        _inputFarads = Resonance.CapacitanceFaradsFor(Model.Centre, InputHenries);
        _outputFarads = 1 / Math.Pow(2 * Math.PI * OutputResonanceHertz, 2) / OutputHenries;
    }

    /// <summary>The amplifier's model.</summary>
    public AmplifierModel Model { get; }

    /// <inheritdoc/>
    public SParameters Evaluate(double hertz, double referenceOhms)
    {
        Require.Positive(hertz, nameof(hertz));
        Require.Positive(referenceOhms, nameof(referenceOhms));
        double omega = 2 * Math.PI * hertz;
        var zIn = new Complex(InputOhms, omega * InputHenries - 1 / (omega * _inputFarads));
        var zOut = new Complex(OutputOhms, omega * OutputHenries - 1 / (omega * _outputFarads));
        double isolation = Math.Pow(10, IsolationDbAtCentre / 20) * hertz / Model.Centre.Hertz;
        var s = new SParameters(
            (zIn - ModelOhms) / (zIn + ModelOhms),
            Model.TransmissionAt(hertz),
            new Complex(0, isolation),
            (zOut - ModelOhms) / (zOut + ModelOhms));

        // The figures above are for 50 Ω; any other reference goes through the chain matrix.
        return referenceOhms == ModelOhms ? s : Abcd.FromSParameters(s, ModelOhms).ToSParameters(referenceOhms);
    }
}
