namespace BenchRunner.Simulator.Devices;

/// <summary>The fixed parts of one preselector resonator: its coil and the fixed capacitor beside the trimmer.</summary>
/// <param name="CoilHenries">The coil's inductance in henries.</param>
/// <param name="CoilQ">The coil's Q at <see cref="PreselectorParts.CoilQFrequency"/> (loss growing as √f).</param>
/// <param name="CoilSelfFarads">The coil's self-capacitance in farads.</param>
/// <param name="FixedFarads">The fixed capacitor in parallel with the trimmer, in farads.</param>
public sealed record ResonatorParts(double CoilHenries, double CoilQ, double CoilSelfFarads, double FixedFarads);
