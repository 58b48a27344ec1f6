namespace BenchRunner.Core.Masks;

/// <summary>Which of a mask's two limits a margin or a failure belongs to.</summary>
public enum LimitSide
{
    /// <summary>The level must stay at or below the limit.</summary>
    Upper,

    /// <summary>The level must stay at or above the limit.</summary>
    Lower,
}
