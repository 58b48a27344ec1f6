using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Yaml;

/// <summary>
/// Collects the problems found while reading a file, so that a reader can go on after the first
/// and report them all at once with <see cref="ThrowIfAny"/>. Keeps at most
/// <see cref="Limit"/> problems; a file with more is reported as having too many.
/// </summary>
public sealed class YamlProblems
{
    private readonly List<InputProblem> _problems = [];

    /// <summary>Creates an empty collection for the file named <paramref name="source"/>.</summary>
    public YamlProblems(string source)
    {
        ArgumentNullException.ThrowIfNull(source);
        Source = source;
    }

    /// <summary>The most problems kept: 50.</summary>
    public const int Limit = 50;

    /// <summary>The file's name as used in messages.</summary>
    public string Source { get; }

    /// <summary>How many problems have been added (counting those beyond the limit).</summary>
    public int Count { get; private set; }

    /// <summary>True when at least one problem has been added.</summary>
    public bool Any => Count > 0;

    /// <summary>Adds a problem at <paramref name="location"/>.</summary>
    public void Add(SourceLocation location, string detail)
    {
        ArgumentNullException.ThrowIfNull(detail);
        Count++;
        if (_problems.Count < Limit)
        {
            _problems.Add(new InputProblem(location, detail));
        }
    }

    /// <summary>Adds a problem at the start of <paramref name="item"/>.</summary>
    public void Add(YamlItem item, string detail) => Add(item.Location, detail);

    /// <summary>
    /// Throws one <see cref="InputFormatException"/> holding every problem, in file order,
    /// when there is any; does nothing otherwise.
    /// </summary>
    public void ThrowIfAny()
    {
        if (Count == 0)
        {
            return;
        }

        // Stable: problems at one place keep the order in which they were found.
        var sorted = _problems
            .Select((p, i) => (Problem: p, Index: i))
            .OrderBy(p => p.Problem.Location.Line)
            .ThenBy(p => p.Problem.Location.Column)
            .ThenBy(p => p.Index)
            .Select(p => p.Problem)
            .ToList();
        if (Count > Limit)
        {
            sorted.Add(new InputProblem(SourceLocation.OfFile(Source), $"{Count - Limit} more problems not shown; correct these first"));
        }

        throw new InputFormatException(sorted);
    }
}
