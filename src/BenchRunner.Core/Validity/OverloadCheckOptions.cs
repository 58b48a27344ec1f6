using BenchRunner.Core.Quantities;

namespace BenchRunner.Core.Validity;

/// <summary>The settings of an attenuation-step comparison.</summary>
public sealed record OverloadCheckOptions
{
    /// <summary>Lines of the lower-attenuation sweep are judged when strictly above this level; default −90 dBm.</summary>
    public Level Threshold { get; init; } = Level.FromDbm(-90);

    /// <summary>How far apart in frequency two lines may be to count as the same; default 1 kHz (use <see cref="SpurLabeller.DefaultTolerance"/> for the RBW).</summary>
    public Frequency FrequencyTolerance { get; init; } = Frequency.FromKilohertz(1);

    /// <summary>The window, ± dB, around 0, −step and −2·step; default 1 dB. Must be below half the step.</summary>
    public double LevelToleranceDb { get; init; } = 1;

    /// <summary>The least prominence of a line in dB, passed to <see cref="Figures.PowerFigures.Peaks"/>; default 6 dB.</summary>
    public double MinExcursionDb { get; init; } = 6;
}
