using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Execution.Plans;

/// <summary>
/// What a step kind's reader (<see cref="StepKind.Read"/>) is given: the step's entry in the plan
/// file, its name and place, the problems of the whole file (add to them; never throw), and the
/// plan's roles.
/// </summary>
public sealed class StepReading
{
    private readonly StrictMap _step;
    private readonly Func<StrictMap, string, InstrumentKind[], string?> _role;

    internal StepReading(StrictMap step, StepKind kind, string? name, SourceLocation at, YamlProblems problems,
        Func<StrictMap, string, InstrumentKind[], string?> role)
    {
        _step = step;
        Kind = kind;
        Name = name;
        At = at;
        Problems = problems;
        _role = role;
    }

    /// <summary>The step's kind.</summary>
    public StepKind Kind { get; }

    /// <summary>The step's name, or null.</summary>
    public string? Name { get; }

    /// <summary>Where the step's word stands in the file.</summary>
    public SourceLocation At { get; }

    /// <summary>The file's problems: a reader adds each problem with its place and returns null.</summary>
    public YamlProblems Problems { get; }

    /// <summary>The step's settings, a mapping with only <paramref name="keys"/>; null (with a problem added) when it is not.</summary>
    public StrictMap? Body(IReadOnlyList<string> keys) => _step.Mapping(Kind.Word, keys);

    /// <summary>
    /// The role named by the body's <c>role</c> key, which the plan's roles must declare as one of
    /// <paramref name="kinds"/>; null (with a located problem) otherwise.
    /// </summary>
    public string? Role(StrictMap body, params InstrumentKind[] kinds) => _role(body, Kind.Word, kinds);
}
