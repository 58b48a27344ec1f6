namespace BenchRunner.Core.Runs;

/// <summary>What a check compared. Stored as <c>mask</c>, <c>figure_limit</c> or <c>overload</c>.</summary>
public enum CheckKind
{
    /// <summary>A trace against a limit mask, point by point.</summary>
    Mask,

    /// <summary>One figure (centre frequency, insertion loss...) against its limits.</summary>
    FigureLimit,

    /// <summary>An attenuation-step test of whether the analyser made lines of its own.</summary>
    Overload,
}
