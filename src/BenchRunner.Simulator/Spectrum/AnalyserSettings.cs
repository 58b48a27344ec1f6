using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Simulator.Spectrum;

/// <summary>One consistent, already validated set of analyser settings, replaced as a whole on every change.</summary>
internal sealed class AnalyserSettings
{
    public AnalyserSettings(Frequency start, Frequency stop, Frequency resolutionBandwidth, Ratio attenuation, Level referenceLevel, int points)
        : this(FrequencyAxis.Linear(start, stop, points), resolutionBandwidth, attenuation, referenceLevel)
    {
    }

    private AnalyserSettings(FrequencyAxis axis, Frequency resolutionBandwidth, Ratio attenuation, Level referenceLevel)
    {
        Axis = axis;
        ResolutionBandwidth = resolutionBandwidth;
        Attenuation = attenuation;
        ReferenceLevel = referenceLevel;
    }

    /// <summary>The sweep's points: linear from start to stop, both included.</summary>
    public FrequencyAxis Axis { get; }

    public Frequency Start => Axis.Start;

    public Frequency Stop => Axis.Stop;

    public int Points => Axis.Count;

    public Frequency ResolutionBandwidth { get; }

    public Ratio Attenuation { get; }

    public Level ReferenceLevel { get; }

    public AnalyserSettings WithSpan(Frequency start, Frequency stop) => new(start, stop, ResolutionBandwidth, Attenuation, ReferenceLevel, Points);

    public AnalyserSettings WithPoints(int points) => new(Start, Stop, ResolutionBandwidth, Attenuation, ReferenceLevel, points);

    public AnalyserSettings WithResolutionBandwidth(Frequency rbw) => new(Axis, rbw, Attenuation, ReferenceLevel);

    public AnalyserSettings WithAttenuation(Ratio attenuation) => new(Axis, ResolutionBandwidth, attenuation, ReferenceLevel);

    public AnalyserSettings WithReferenceLevel(Level level) => new(Axis, ResolutionBandwidth, Attenuation, level);
}
