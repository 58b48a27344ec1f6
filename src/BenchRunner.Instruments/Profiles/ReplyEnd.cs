namespace BenchRunner.Instruments.Profiles;

/// <summary>How the end of a sweep's data is recognised.</summary>
public enum ReplyEnd
{
    /// <summary>The data ends at the device's prompt (<c>prompt</c>).</summary>
    Prompt,

    /// <summary>The data ends after as many point lines as the sweep has points (<c>points</c>).</summary>
    PointCount,

    /// <summary>The data ends at a line of fixed text such as <c>end</c> (<c>line</c>, with <c>end-line</c>).</summary>
    EndLine,

    /// <summary>The data is the one data line itself (the one-line layout without a prompt).</summary>
    DataLine,
}
