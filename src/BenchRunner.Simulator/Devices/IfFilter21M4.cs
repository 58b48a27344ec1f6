using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Circuits;

namespace BenchRunner.Simulator.Devices;

/// <summary>
/// The workshop's 21.4 MHz IF filter: four crystal resonators built as two two-pole monolithic
/// crystal filters in tandem, designed as a 4-pole maximally flat (Butterworth) band-pass about
/// 36 kHz wide at −3 dB. Its equivalent circuit: each resonator's motional arm (Lm, Cm = 20 fF,
/// Q 25 000) in series, coupled by shunt capacitors (the acoustic coupling inside each filter and
/// the electrode capacitances plus a coupling capacitor at the junction of the two), with series
/// capacitors in the end meshes so that all four meshes resonate at 21.4 MHz. At each port the
/// electrode capacitance (3.5 pF) is tuned out by a parallel coil (Q 80), and an ideal transformer
/// matches 50 Ω to the filter's termination of about 820 Ω. Coupling and terminations follow the
/// coupled-resonator design rules k(i,i+1) = FBW/√(g_i·g_i+1) and Qe = g1/FBW (Matthaei, Young
/// and Jones; from memory). Loss about 0.6 dB; passes docs/examples/if-21m4-relative.yaml.
/// </summary>
public static class IfFilter21M4
{
    /// <summary>The centre frequency, 21.4 MHz.</summary>
    public static Frequency Centre { get; } = Frequency.FromMegahertz(21.4);

    /// <summary>The design −3 dB bandwidth, 36 kHz.</summary>
    public static Frequency DesignBandwidth { get; } = Frequency.FromKilohertz(36);

    private const double MotionalFarads = 20e-15;
    private const double CrystalQ = 25_000;
    private const double ElectrodeFarads = 3.5e-12;
    private const double PortCoilQ = 80;
    private static readonly double[] Prototype = [0.7654, 1.8478, 1.8478, 0.7654];

    /// <summary>The filter's circuit between 50 Ω ports.</summary>
    public static Network Create()
    {
        double f0 = Centre.Hertz, w0 = 2 * Math.PI * f0;
        double fbw = DesignBandwidth.Hertz / f0;
        var g = Prototype;
        var coupling = new double[g.Length - 1];
        for (int i = 0; i < coupling.Length; i++)
        {
            coupling[i] = MotionalFarads / (fbw / Math.Sqrt(g[i] * g[i + 1]));
        }

        // The inner meshes hold Cm with two coupling capacitors in series; the end meshes get a
        // series capacitor equal to the inner coupling one so that every mesh tunes alike.
        double loopFarads = 1 / (1 / MotionalFarads + 1 / coupling[0] + 1 / coupling[1]);
        double motionalHenries = 1 / (w0 * w0 * loopFarads);
        double crystalHertz = 1 / (2 * Math.PI * Math.Sqrt(motionalHenries * MotionalFarads));
        double lossOhms = 2 * Math.PI * crystalHertz * motionalHenries / CrystalQ;
        double terminationOhms = w0 * motionalHenries * fbw / g[0];
        double portHenries = 1 / (w0 * w0 * ElectrodeFarads);

        var crystal = new SeriesCombination(Inductor.Ideal(motionalHenries), new Capacitor(MotionalFarads), new Resistor(lossOhms));
        var port = new ParallelCombination(new Capacitor(ElectrodeFarads), Inductor.WithQ(portHenries, PortCoilQ));
        var elements = new List<NetworkElement>
        {
            IdealTransformer.Matching(50, terminationOhms),
            Elements.Shunt(port),
            Elements.SeriesCapacitor(coupling[1]),
        };
        for (int i = 0; i < g.Length; i++)
        {
            elements.Add(Elements.Series(crystal));
            if (i < coupling.Length)
            {
                elements.Add(Elements.ShuntCapacitor(coupling[i]));
            }
        }

        elements.Add(Elements.SeriesCapacitor(coupling[1]));
        elements.Add(Elements.Shunt(port));
        elements.Add(IdealTransformer.Matching(terminationOhms, 50));
        return new Network(elements);
    }
}
