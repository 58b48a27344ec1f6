using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Tests.Plans;

public sealed class PlanFileFigureTests
{
    private static string Plan(string figures) => $$"""
        plan: p
        roles:
          vna: network-analyser
        steps:
          - set-network-analyser: { role: vna, start: 127.5 MHz, stop: 147.5 MHz, points: 401 }
          - sweep: { role: vna, traces: { S21: passband } }
          - check-figures:
              trace: passband
              figures: { {{figures}} }
        """;

    private static TestPlan Parse(string figures) => PlanFile.Parse(Plan(figures), "plan.yaml", RepositoryFiles.Example("plans"));

    [Fact]
    public void Parse_FigureWords_GiveTheTypedKeysWithTheirUnits()
    {
        var plan = Parse("center_hz: { target: 137.5 MHz, tolerance: 300 kHz }, loaded_q: { min: 40 }, peak_db: { min: -3 dB }");

        var limits = plan.Steps.OfType<FigureCheck>().Single().Limits;
        Assert.Equal([FigureKeys.CentreFrequency, FigureKeys.LoadedQ, FigureKeys.PeakLevel], limits.Select(l => l.Key));
        Assert.Equal([QuantityUnit.Hertz, QuantityUnit.None, QuantityUnit.Decibel], limits.Select(l => l.Unit));
        Assert.Equal((137.2e6, 137.8e6), (limits[0].Min!.Value, limits[0].Max!.Value));
    }

    [Fact]
    public void Parse_UnknownFigureWord_IsALocatedErrorListingTheWordsOfTheTrace()
    {
        var ex = Assert.Throws<InputFormatException>(() => Parse("centre_hz: { max: 1 MHz }"));

        var problem = Assert.Single(ex.Problems);
        Assert.Equal((9, 18), (problem.Location.Line, problem.Location.Column));
        var words = string.Join(", ", FigureCatalogue.For(TraceQuantity.S21).Select(f => f.Key.Word).Distinct());
        Assert.Equal($"unknown figure \"centre_hz\"; expected one of {words}", problem.Detail);
        Assert.Contains("center_hz", words);
    }

    [Fact]
    public void Parse_MinAboveMax_ShowsBothAsWritten()
    {
        var ex = Assert.Throws<InputFormatException>(() => Parse("insertion_loss_db: { min: 4.125 dB, max: 4.1 dB }"));

        Assert.Contains("(4.125 dB) is above its \"max\" (4.1 dB)", Assert.Single(ex.Problems).Detail);
    }
}
