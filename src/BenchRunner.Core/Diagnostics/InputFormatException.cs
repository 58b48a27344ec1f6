namespace BenchRunner.Core.Diagnostics;

/// <summary>
/// Raised when a user's file (trace, mask, plan, profile, configuration) is malformed.
/// It carries where the problem is and what was expected, so the command line can print
/// one line such as <c>mask.yaml:12:9: expected a frequency such as "137.5 MHz"</c>
/// and exit with the "bad input" code. A reader that collects several problems in one pass
/// raises one exception holding all of them (<see cref="Problems"/>); its message then has
/// one such line per problem.
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
        Problems = [new InputProblem(location, detail)];
    }

    /// <summary>Creates the exception for several problems; the first is <see cref="Location"/> and <see cref="Detail"/>.</summary>
    /// <exception cref="ArgumentException">No problems given.</exception>
    public InputFormatException(IReadOnlyList<InputProblem> problems)
        : base(string.Join("\n", Check(problems)))
    {
        Location = problems[0].Location;
        Detail = problems[0].Detail;
        Problems = [.. problems];
    }

    /// <summary>Where the (first) problem is.</summary>
    public SourceLocation Location { get; }

    /// <summary>What is wrong and what was expected, without the location (of the first problem).</summary>
    public string Detail { get; }

    /// <summary>Every problem reported, at least one, in file order.</summary>
    public IReadOnlyList<InputProblem> Problems { get; }

    private static IReadOnlyList<InputProblem> Check(IReadOnlyList<InputProblem> problems)
    {
        ArgumentNullException.ThrowIfNull(problems);
        return problems.Count > 0 ? problems : throw new ArgumentException("At least one problem is needed.", nameof(problems));
    }
}
