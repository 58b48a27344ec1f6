namespace BenchRunner.Core.Diagnostics;

/// <summary>
/// Raised when a user's file (trace, mask, plan, profile, configuration) is malformed.
/// It carries where the problem is and what was expected, so the command line can print
/// one line such as <c>mask.yaml:12:9: expected a frequency such as "137.5 MHz"</c>
/// and exit with the "bad input" code.
/// </summary>
public sealed class InputFormatException : Exception
{
    /// <summary>Creates the exception for a problem at <paramref name="location"/>.</summary>
    /// <param name="location">Where the problem is.</param>
    /// <param name="detail">What is wrong and what was expected, without the location.</param>
    /// <param name="inner">The underlying error, if any.</param>
    public InputFormatException(SourceLocation location, string detail, Exception? inner = null)
        : base($"{location}: {detail}", inner)
    {
        Location = location;
        Detail = detail;
    }

    /// <summary>Where the problem is.</summary>
    public SourceLocation Location { get; }

    /// <summary>What is wrong and what was expected, without the location.</summary>
    public string Detail { get; }
}
