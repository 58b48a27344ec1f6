using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Plans;
using BenchRunner.Instruments.Kinds;

namespace BenchRunner.Execution.Tests.Plans;

public sealed class PlanWriterTests
{
    private static readonly SourceLocation At = SourceLocation.OfFile("built in code");

    private static TestPlan Built() => new("overload-check", "a \"quoted\" description: with a colon",
        [new RoleRequirement("sa", InstrumentKind.SpectrumAnalyser, At), new RoleRequirement("gen-1", InstrumentKind.SignalGenerator, At),
         new RoleRequirement("vna", InstrumentKind.NetworkAnalyser, At)],
        [
            new GeneratorSetup("test tone", At, "gen-1", Frequency.FromHertz(137_512_345.678), Level.FromDbm(-30.25), true, At),
            new SpectrumAnalyserSetup(null, At, "sa", Frequency.FromMegahertz(135.5), Frequency.FromMegahertz(139.5), Frequency.FromKilohertz(10), Ratio.FromDecibels(5), Level.FromDbm(-10)),
            new NetworkAnalyserSetup("setup", At, "vna", Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401, Frequency.FromKilohertz(1)),
            new SweepStep("sweep", At, "vna", [new NamedTrace(TraceQuantity.S21, "passband", At), new NamedTrace(TraceQuantity.S11, "match", At)]),
            new OverloadCheckStep("overload check", At, "sa", new NamedTrace(TraceQuantity.Power, "spectrum", At), Ratio.FromDecibels(10),
                Level.FromDbm(-85), 1.5, [Frequency.FromMegahertz(137.5)], [Frequency.FromMegahertz(137.8), Frequency.FromMegahertz(275)]),
            new WaitStep("settle", At, TimeSpan.FromMilliseconds(2500)),
            new MessageStep(null, At, "Turn the trimmer: slowly, then wait."),
            new GeneratorSetup("off", At, "gen-1", null, null, false, At),
        ],
        "built in code");

    [Fact]
    public void Write_ThenRead_GivesBackTheSamePlan()
    {
        var plan = Built();

        var text = PlanWriter.Write(plan, "Written by a test.");
        var read = PlanFile.Parse(text, "written.yaml", ".");

        Assert.StartsWith("# Written by a test.\n", text, StringComparison.Ordinal);
        Assert.Equal(plan.Name, read.Name);
        Assert.Equal(plan.Description, read.Description);
        Assert.Equal(plan.Roles.Select(r => (r.Role, r.Kind)), read.Roles.Select(r => (r.Role, r.Kind)));
        Assert.Equal(plan.Steps.Count, read.Steps.Count);
        for (int i = 0; i < plan.Steps.Count; i++)
        {
            // Locations differ (code against file); everything else must be equal, every digit included.
            Assert.Equal(Normalised(plan.Steps[i]), Normalised(read.Steps[i]));
        }
    }

    [Fact]
    public void Write_ItsOwnOutputAgain_IsTheSameText()
    {
        var text = PlanWriter.Write(Built());

        Assert.Equal(text, PlanWriter.Write(PlanFile.Parse(text, "written.yaml", ".")));
    }

    [Fact]
    public void Write_AStepThatRefersToAFile_IsRefusedRatherThanWrittenWrongly()
    {
        var plan = PlanFile.Load(RepositoryFiles.Example("plans/psf-137-check.yaml"));

        var ex = Assert.Throws<NotSupportedException>(() => PlanWriter.Write(plan));
        Assert.Contains("check-mask", ex.Message, StringComparison.Ordinal);
    }

    private static string Normalised(PlanStep step)
    {
        var at = SourceLocation.OfFile("x");
        PlanStep plain = step switch
        {
            GeneratorSetup g => g with { Location = at, LevelLocation = at },
            SweepStep s => s with { Location = at, Traces = [.. s.Traces.Select(t => t with { Location = at })] },
            OverloadCheckStep o => o with { Location = at, Trace = o.Trace with { Location = at } },
            _ => step with { Location = at },
        };
        // Lists compare by reference in records: spell them out.
        return plain switch
        {
            SweepStep s => $"{s with { Traces = [] }} {string.Join(";", s.Traces)}",
            OverloadCheckStep o => $"{o with { Carriers = [], Lines = null }} {string.Join(";", o.Carriers.Select(c => c.Hertz))} {string.Join(";", o.Lines!.Select(c => c.Hertz))}",
            _ => plain.ToString(),
        };
    }
}
