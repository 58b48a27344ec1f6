namespace BenchRunner.Instruments.Profiles;

/// <summary>How the points of a sweep are laid out in a reply.</summary>
public enum ReplyLayout
{
    /// <summary>One line per point, its columns separated (<c>point-per-line</c>).</summary>
    PointPerLine,

    /// <summary>All points on one line, the columns of each point in turn (<c>one-line</c>).</summary>
    OneLine,
}
