namespace BenchRunner.Simulator.NetworkAnalyser;

/// <summary>
/// How a <see cref="SimulatedNetworkAnalyser"/> is built. Defaults in each property's description.
/// </summary>
public sealed record NetworkAnalyserOptions
{
    /// <summary>The seed of the trace noise; 1 by default. The same seed and the same calls give the same traces.</summary>
    public long Seed { get; init; } = 1;

    /// <summary>The serial number it reports; <c>SV-0001</c> by default.</summary>
    public string Serial { get; init; } = "SV-0001";

    /// <summary>The firmware level it reports; <c>1.0</c> by default.</summary>
    public string Firmware { get; init; } = "1.0";

    /// <summary>Its limits; <see cref="NetworkAnalyserLimits.Default"/> by default.</summary>
    public NetworkAnalyserLimits Limits { get; init; } = NetworkAnalyserLimits.Default;

    /// <summary>
    /// The rms noise magnitude added to every sample (the floor a |S21| trace bottoms out at) at
    /// the reference IF bandwidth with no averaging, in dB (20·log10); −90 dB by default.
    /// </summary>
    public double NoiseFloorDb { get; init; } = -90;

    /// <summary>
    /// The rms relative noise on every sample (trace noise, proportional to the signal) at the
    /// reference IF bandwidth with no averaging, as a fraction; 0.001 (about 0.009 dB) by default.
    /// </summary>
    public double TraceNoiseFraction { get; init; } = 0.001;

    /// <summary>Whether trace noise is added at all; true by default. Off, the traces are the exact response.</summary>
    public bool NoiseEnabled { get; init; } = true;
}
