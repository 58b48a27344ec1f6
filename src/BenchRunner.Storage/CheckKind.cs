namespace BenchRunner.Storage;

/// <summary>What a check compared. Stored as <c>mask</c> or <c>figure_limit</c>.</summary>
public enum CheckKind
{
    /// <summary>A trace against a limit mask, point by point.</summary>
    Mask,

    /// <summary>One figure (centre frequency, insertion loss...) against its limits.</summary>
    FigureLimit,
}
