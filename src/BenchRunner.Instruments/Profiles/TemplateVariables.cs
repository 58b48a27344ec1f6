namespace BenchRunner.Instruments.Profiles;

/// <summary>The names each kind of command may use in its placeholders.</summary>
internal static class TemplateVariables
{
    public static readonly IReadOnlyList<TemplateVariable> None = [];

    private static readonly TemplateVariable[] SweepRange =
    [
        new("start", TemplateValueKind.Frequency), new("stop", TemplateValueKind.Frequency),
        new("centre", TemplateValueKind.Frequency), new("span", TemplateValueKind.Frequency),
    ];

    /// <summary>Network analyser setup, sweep and read commands.</summary>
    public static readonly IReadOnlyList<TemplateVariable> NetworkSweep = [.. SweepRange, new("points", TemplateValueKind.Count)];

    /// <summary>The network analyser's IF bandwidth command.</summary>
    public static readonly IReadOnlyList<TemplateVariable> NetworkIfBandwidth = [.. NetworkSweep, new("ifbw", TemplateValueKind.Frequency)];

    /// <summary>The network analyser's averaging command.</summary>
    public static readonly IReadOnlyList<TemplateVariable> NetworkAverages = [.. NetworkSweep, new("averages", TemplateValueKind.Count)];

    /// <summary>Spectrum analyser setup, sweep and read commands.</summary>
    public static readonly IReadOnlyList<TemplateVariable> Spectrum =
    [
        .. SweepRange, new("rbw", TemplateValueKind.Frequency), new("attenuation", TemplateValueKind.Ratio),
        new("reference", TemplateValueKind.Level), new("points", TemplateValueKind.Count),
    ];

    /// <summary>The generator's frequency command.</summary>
    public static readonly IReadOnlyList<TemplateVariable> GeneratorFrequency = [new("frequency", TemplateValueKind.Frequency)];

    /// <summary>The generator's level command.</summary>
    public static readonly IReadOnlyList<TemplateVariable> GeneratorLevel = [new("level", TemplateValueKind.Level)];

    /// <summary>The generator's output switch command.</summary>
    public static readonly IReadOnlyList<TemplateVariable> GeneratorOutput = [new("output", TemplateValueKind.Switch)];
}
