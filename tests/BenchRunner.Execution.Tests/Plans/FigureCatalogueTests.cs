using BenchRunner.Core.Figures;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;
using BenchRunner.Execution.Plans;

namespace BenchRunner.Execution.Tests.Plans;

public sealed class FigureCatalogueTests
{
    [Fact]
    public void Catalogue_MatchesTheFiguresCoreComputes_KeyForKeyAndUnitForUnit()
    {
        var s21 = TraceFile.Read(RepositoryFiles.Example("psf-24-0001.s2p")).Find(TraceQuantity.S21)!;
        var spectrum = new PowerTrace(FrequencyAxis.Linear(Core.Quantities.Frequency.FromMegahertz(137), Core.Quantities.Frequency.FromMegahertz(138), 101),
            Enumerable.Range(0, 101).Select(i => i == 50 ? -30.0 : -100.0));
        var computed = FigureSummary.ForFilter(s21).Select(f => (Key: f.Key.Word, Unit: f.Unit.Symbol, Spectrum: false))
            .Concat(FigureSummary.ForSpectrum(spectrum).Select(f => (Key: f.Key.Word, Unit: f.Unit.Symbol, Spectrum: true)))
            .ToHashSet();

        var catalogued = FigureCatalogue.All.Select(f => (Key: f.Key.Word, Unit: f.Unit.Symbol, Spectrum: f.OfSpectrum)).ToHashSet();

        Assert.Equal(computed.OrderBy(c => c.Key).ThenBy(c => c.Spectrum), catalogued.OrderBy(c => c.Key).ThenBy(c => c.Spectrum));
    }
}
