namespace BenchRunner.Core.Masks;

/// <summary>What a mask's corner levels are measured from.</summary>
public enum MaskReference
{
    /// <summary>Corner levels are absolute: dB for S-parameters, dBm for power (the default).</summary>
    Absolute,

    /// <summary>
    /// Corner levels are dB offsets from the trace's highest sample, so the mask checks the
    /// response's shape whatever its absolute gain or level.
    /// </summary>
    RelativeToPeak,
}
