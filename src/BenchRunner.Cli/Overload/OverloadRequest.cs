using System.Globalization;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Plans;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Bench;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Cli.Overload;

/// <summary>
/// What <c>benchrunner overload</c> was asked to do, checked and turned into plan text, so that the
/// check runs through the same reader, pre-check, interlock and result file as any plan.
/// </summary>
public sealed class OverloadRequest
{
    /// <summary>The name the generated plan carries in the result file.</summary>
    public const string PlanName = "overload-check";

    /// <summary>The spectrum analyser's role.</summary>
    public required string Analyser { get; init; }

    /// <summary>The lower edge of the span.</summary>
    public required Frequency Start { get; init; }

    /// <summary>The upper edge of the span.</summary>
    public required Frequency Stop { get; init; }

    /// <summary>The resolution bandwidth.</summary>
    public required Frequency Rbw { get; init; }

    /// <summary>The input attenuation of the first sweep.</summary>
    public required Ratio Attenuation { get; init; }

    /// <summary>How much the second sweep raises it.</summary>
    public required Ratio RaiseBy { get; init; }

    /// <summary>Lines strictly above this level are judged.</summary>
    public required Level Threshold { get; init; }

    /// <summary>The level tolerance.</summary>
    public required Ratio Tolerance { get; init; }

    /// <summary>The carriers, for names and dBc.</summary>
    public IReadOnlyList<Frequency> Carriers { get; init; } = [];

    /// <summary>The lines relied on; empty means every line.</summary>
    public IReadOnlyList<Frequency> Lines { get; init; } = [];

    /// <summary>The generator's role when a test tone is to be set, else null.</summary>
    public string? Generator { get; init; }

    /// <summary>The test tone's frequency.</summary>
    public Frequency? ToneFrequency { get; init; }

    /// <summary>The test tone's level.</summary>
    public Level? ToneLevel { get; init; }

    /// <summary>The only instrument of <paramref name="kind"/> on the bench, or the one named; a usage error otherwise.</summary>
    /// <exception cref="UsageException">No such instrument, or several and none named.</exception>
    public static string PickRole(BenchDefinition bench, InstrumentKind kind, string? named, string option)
    {
        ArgumentNullException.ThrowIfNull(bench);
        var word = kind.Word;
        var candidates = bench.Instruments.Values.Where(i => i.Kind == kind).Select(i => i.Role).ToList();
        if (named is not null)
        {
            return candidates.Contains(named)
                ? named
                : throw new UsageException($"{option} {named}: the bench \"{bench.Name}\" has no {word} of that name; it has {(candidates.Count == 0 ? "none" : string.Join(", ", candidates))}.");
        }

        return candidates.Count switch
        {
            1 => candidates[0],
            0 => throw new UsageException($"the bench \"{bench.Name}\" has no {word}."),
            _ => throw new UsageException($"the bench \"{bench.Name}\" has several of kind {word} ({string.Join(", ", candidates)}); name one with {option}."),
        };
    }

    /// <summary>Where the generated plan says it came from, in messages.</summary>
    public const string Source = "benchrunner overload (generated plan)";

    /// <summary>
    /// The request as a plan (docs/plan-format.md): an optional test tone, the analyser's setting, the
    /// overload check, and the tone switched off again. It runs through the same pre-check, interlock
    /// and result file as any plan; the text stored with it is its faithful rendering.
    /// </summary>
    public TestPlan ToPlan()
    {
        var at = SourceLocation.OfFile(Source);
        var roles = new List<RoleRequirement> { new(Analyser, InstrumentKind.SpectrumAnalyser, at) };
        var steps = new List<PlanStep>();
        if (Generator is not null)
        {
            roles.Add(new RoleRequirement(Generator, InstrumentKind.SignalGenerator, at));
            steps.Add(new GeneratorSetup("test tone", at, Generator, ToneFrequency, ToneLevel, true, at));
        }

        steps.Add(new SpectrumAnalyserSetup("analyser setup", at, Analyser, Start, Stop, Rbw, Attenuation, null));
        steps.Add(new OverloadCheckStep("overload check", at, Analyser, new NamedTrace(TraceQuantity.Power, "spectrum", at),
            RaiseBy, Threshold, Tolerance.Decibels, Carriers, Lines.Count > 0 ? Lines : null));
        if (Generator is not null)
        {
            steps.Add(new GeneratorSetup("test tone off", at, Generator, null, null, false, at));
        }

        return new TestPlan(PlanName, null, roles, steps, Source);
    }

    /// <summary>Parses a command-line value with its unit.</summary>
    /// <exception cref="UsageException">It does not parse.</exception>
    public static T Parse<T>(string value, string option, Func<string, ParseResult<T>> parse)
    {
        var parsed = parse(value);
        return parsed.Success ? parsed.Value : throw new UsageException($"{option} {value}: {parsed.Error}");
    }

    /// <summary>A frequency from the command line; the unit is required.</summary>
    /// <exception cref="UsageException">It does not parse or has no unit.</exception>
    public static Frequency ParseFrequency(string value, string option)
    {
        var f = Parse(value, option, Frequency.Parse);
        return value.TrimEnd().EndsWith("hz", true, CultureInfo.InvariantCulture) && f.Hertz > 0
            ? f
            : throw new UsageException($"{option} {value}: expected a frequency above 0 Hz with its unit, such as \"137.5 MHz\" or 137.5MHz");
    }
}
