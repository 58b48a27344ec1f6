namespace BenchRunner.Core.Diagnostics;

/// <summary>One problem found in a user's file: where it is and what was expected.</summary>
/// <param name="Location">Where the problem is.</param>
/// <param name="Detail">What is wrong and what was expected, without the location.</param>
public readonly record struct InputProblem(SourceLocation Location, string Detail)
{
    /// <summary>Formats as <c>file:line:column: detail</c>.</summary>
    public override string ToString() => $"{Location}: {Detail}";
}
