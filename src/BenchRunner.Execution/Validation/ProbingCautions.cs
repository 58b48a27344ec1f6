using System.Globalization;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Validation;

/// <summary>
/// The cautions a plan must show before it runs when it looks into a working circuit: a spectrum
/// analyser it sweeps sits behind a series-resistor probe in the bench's compensation.
/// </summary>
public static class ProbingCautions
{
    /// <summary>The cautions for <paramref name="plan"/> on <paramref name="bench"/>; empty when the plan probes nothing.</summary>
    public static IReadOnlyList<string> For(TestPlan plan, BenchDefinition bench)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(bench);
        var swept = plan.AllSteps()
            .Select(s => s switch { SweepStep sweep => sweep.Role, OverloadCheckStep overload => overload.Role, _ => null })
            .OfType<string>().Distinct(StringComparer.Ordinal);
        var probes = swept.Select(bench.CompensationOf).OfType<InputCompensation>().Where(c => c.HasProbe).ToList();
        return probes.Count == 0 ? [] : [.. probes.SelectMany(p => ForProbe(p, bench))];
    }

    /// <summary>The cautions for one probed input.</summary>
    public static IReadOnlyList<string> ForProbe(InputCompensation probe, BenchDefinition bench)
    {
        ArgumentNullException.ThrowIfNull(probe);
        ArgumentNullException.ThrowIfNull(bench);
        var lines = new List<string>
        {
            $"CAUTION: {probe.Role} probes inside a working circuit ({probe.Description}).",
            "  Never connect the probe or the analyser to mains-powered or high-voltage circuits; work only on low-voltage circuits you are allowed to open.",
            probe.DcBlock is null
                ? $"  No DC block is declared before {probe.Role}: put one in the path wherever DC may be present on the probed point, and declare it."
                : "  Keep the DC block in the path: DC on an analyser input can destroy its mixer.",
        };
        if (bench.Instruments.TryGetValue(probe.Role, out var analyser) && analyser.MaxInputLevel is { } max)
        {
            var atProbe = max.Plus(probe.LeastLoss);
            lines.Add(string.Create(CultureInfo.InvariantCulture,
                $"  {probe.Role}'s maximum input is {max}; through the probe path that is about {atProbe.Dbm:0.#} dBm at the probed point. Never exceed it."));
        }

        lines.Add("  Mind RF exposure and ESD, and defer to local codes and licensed practice.");
        return lines;
    }
}
