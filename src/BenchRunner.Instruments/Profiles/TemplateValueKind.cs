namespace BenchRunner.Instruments.Profiles;

/// <summary>What kind of value a template variable holds; it decides which placeholder types fit.</summary>
public enum TemplateValueKind
{
    /// <summary>A frequency, written as hz, khz, mhz or ghz.</summary>
    Frequency,

    /// <summary>A level in dBm.</summary>
    Level,

    /// <summary>A ratio in dB.</summary>
    Ratio,

    /// <summary>A whole number.</summary>
    Count,

    /// <summary>A switch, written with the profile's bool words.</summary>
    Switch,
}
