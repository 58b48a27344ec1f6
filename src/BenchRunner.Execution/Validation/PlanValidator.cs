using System.Globalization;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Validation;

/// <summary>
/// Checks a plan against a bench before anything is touched: every role the plan needs is on
/// the bench with the right kind, and no generator setting can drive an analyser's input above
/// its declared maximum through the declared paths (the safety pre-check).
/// </summary>
public static class PlanValidator
{
    /// <summary>The caution that ends every safety problem.</summary>
    public const string Caution = "never exceed an input's maximum level: lower the level, or put an attenuator in the path";

    /// <summary>The problems between a plan and a bench, in plan order; empty when the plan can run there.</summary>
    public static IReadOnlyList<InputProblem> CheckAgainstBench(TestPlan plan, BenchDefinition bench)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(bench);
        var problems = new List<InputProblem>();
        foreach (var role in plan.Roles)
        {
            if (!bench.Instruments.TryGetValue(role.Role, out var instrument))
            {
                var has = bench.Instruments.Count == 0 ? "none" : string.Join(", ", bench.Instruments.Keys);
                problems.Add(new(role.Location, $"the plan needs a {role.Kind.Word} \"{role.Role}\", but the bench \"{bench.Name}\" ({bench.Source}) has no instrument of that name; it has {has}"));
            }
            else if (instrument.Kind != role.Kind)
            {
                problems.Add(new(role.Location, $"the plan needs \"{role.Role}\" to be a {role.Kind.Word}, but on the bench \"{bench.Name}\" it is a {instrument.Kind.Word} ({instrument.Location})"));
            }
        }

        foreach (var step in plan.AllSteps().OfType<GeneratorSetup>())
        {
            if (step.Level is { } level && bench.Instruments.TryGetValue(step.Role, out var gen))
            {
                CheckLevel(step, level, gen, bench, problems);
            }
        }

        foreach (var step in plan.AllSteps().OfType<SpectrumAnalyserSetup>())
        {
            if (bench.CompensationOf(step.Role) is { CablePoints.Count: > 0 } fixture
                && (step.Start < fixture.CablePoints.Min(p => p.Frequency) || step.Stop > fixture.CablePoints.Max(p => p.Frequency)))
            {
                problems.Add(new(step.Location,
                    $"the span {step.Start} to {step.Stop} of {step.Role} reaches outside the cable table of its compensation ({fixture.CablePoints.Min(p => p.Frequency)} to {fixture.CablePoints.Max(p => p.Frequency)}, {fixture.Location}); a loss is never extrapolated: extend the table or narrow the span"));
            }
        }

        return problems;
    }

    private static void CheckLevel(GeneratorSetup step, Level level, BenchInstrument gen, BenchDefinition bench, List<InputProblem> problems)
    {
        if (gen.MaxOutputLevel is { } maxOut && level > maxOut)
        {
            problems.Add(new(step.LevelLocation, $"{gen.Role} level {Signed(level)} is above its declared maximum output of {Signed(maxOut)} ({gen.Location})"));
        }

        foreach (var path in bench.PathsFrom(gen.Role))
        {
            if (!bench.Instruments.TryGetValue(path.To, out var receiver) || receiver.MaxInputLevel is not { } maxIn)
            {
                continue;
            }

            // With a compensation the path ends at the probed point; the fixture's least loss lies between it and the input.
            var fixture = bench.CompensationOf(path.To);
            var reached = level.Plus(path.Gain - (fixture?.LeastLoss ?? Ratio.Unity));
            if (reached > maxIn)
            {
                var through = fixture is null ? "" : $" and {receiver.Role}'s compensated input path (at least {Signed(fixture.LeastLoss.Decibels, "dB")} of loss)";
                problems.Add(new(step.LevelLocation,
                    $"{gen.Role} level {Signed(level)} through {path.Label} ({Signed(path.Gain)}){through} reaches {Signed(reached)} at {receiver.Role}, above its declared maximum input of {Signed(maxIn)}; {Caution}"));
            }
        }
    }

    private static string Signed(Level level) => Signed(level.Dbm, "dBm");

    private static string Signed(Ratio ratio) => Signed(ratio.Decibels, "dB");

    private static string Signed(double value, string unit)
    {
        var rounded = Math.Round(value, 3);
        var text = rounded.ToString("0.###", CultureInfo.InvariantCulture);
        return rounded > 0 ? $"+{text} {unit}" : $"{text} {unit}";
    }
}
