using BenchRunner.Core.Figures;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;

namespace BenchRunner.Simulator.Tests.Devices;

public class BoardLotTests
{
    private static readonly FrequencyAxis Axis = FrequencyAxis.Linear(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401);

    private static Trace S21Of(ITwoPort board) => board.Sweep(Axis, [TraceQuantity.S21])[0];

    [Fact]
    public void Generate_Default_GivesTwentyBoardsWithSerialsInOrder()
    {
        var lot = BoardLot.Generate();

        Assert.Equal(BoardLot.DefaultSeed, lot.Seed);
        Assert.Equal(Enumerable.Range(1, 20).Select(i => $"PSF-24-{i:0000}"), lot.Boards.Select(b => b.Serial));
    }

    [Fact]
    public void Generate_DefaultSeed_FailsThreeBoardsAgainstTheExampleMask()
    {
        // Documented in docs/simulator.md: with seed 73 boards 0002 and 0020 have an output trimmer at
        // the end of its travel (a coil too far off to align), board 0012 was set high by the assembler.
        var mask = MaskFile.Load(RepositoryFiles.Example("psf-137-passband.yaml"));

        var failed = BoardLot.Generate().Boards.Where(b => !mask.Evaluate(S21Of(b)).Passed).Select(b => b.Serial);

        Assert.Equal(["PSF-24-0002", "PSF-24-0012", "PSF-24-0020"], failed);
    }

    [Fact]
    public void Generate_DefaultSeed_SpreadsCentreAndLossRealistically()
    {
        var figures = BoardLot.Generate().Boards.Select(b => S21Of(b)).Select(t => (
            Centre: TraceFigures.Bandwidth(t).Value.Centre.Megahertz,
            Loss: TraceFigures.InsertionLoss(t).Value)).ToList();

        double mean = figures.Average(f => f.Centre);
        double sd = Math.Sqrt(figures.Sum(f => (f.Centre - mean) * (f.Centre - mean)) / (figures.Count - 1));
        Assert.InRange(mean, 137.45, 137.62);
        Assert.InRange(sd, 0.05, 0.3);
        Assert.InRange(figures.Min(f => f.Loss), 2.0, 2.5);
        Assert.InRange(figures.Max(f => f.Loss), 2.8, 4.0);
    }

    [Fact]
    public void Generate_PartsStayWithinTheirTolerances()
    {
        var nominal = Preselector137.NominalParts;

        foreach (var board in BoardLot.Generate(50).Boards)
        {
            for (int r = 0; r < 3; r++)
            {
                Assert.InRange(board.Parts.Resonator(r).CoilHenries, nominal.Input.CoilHenries * 0.95, nominal.Input.CoilHenries * 1.05);
                Assert.InRange(board.Parts.Resonator(r).FixedFarads, nominal.Input.FixedFarads * 0.95, nominal.Input.FixedFarads * 1.05);
            }

            Assert.InRange(board.Parts.InputTopFarads, nominal.InputTopFarads * 0.95, nominal.InputTopFarads * 1.05);
            Assert.True(Preselector137.WithinTravel(board.Trimmers));
        }
    }

    [Fact]
    public void Generate_SameSeed_GivesIdenticalTraces()
    {
        var first = BoardLot.Generate(5, seed: 42).Boards.Select(board => ((ComplexTrace)S21Of(board)).Samples).ToList();
        var second = BoardLot.Generate(5, seed: 42).Boards.Select(board => ((ComplexTrace)S21Of(board)).Samples).ToList();

        for (int i = 0; i < first.Count; i++)
        {
            Assert.True(first[i].SequenceEqual(second[i]), $"board {i} differs");
        }
    }

    [Fact]
    public void Generate_DifferentSeeds_GiveDifferentBoards()
    {
        var a = BoardLot.Generate(5, seed: 42).Boards;
        var b = BoardLot.Generate(5, seed: 43).Boards;

        Assert.All(Enumerable.Range(0, 5), i => Assert.NotEqual(a[i].Parts, b[i].Parts));
        Assert.False(((ComplexTrace)S21Of(a[0])).Samples.SequenceEqual(((ComplexTrace)S21Of(b[0])).Samples));
    }

    [Fact]
    public void Generate_NoSpread_GivesNominalAlignedBoards()
    {
        var none = new LotTolerances { CapacitorFraction = 0, CoilFraction = 0, CoilQSigmaFraction = 0, CoilSelfCapacitanceFraction = 0, TrimmerSettingSigmaPicofarads = 0 };

        var board = BoardLot.Generate(1, tolerances: none).Boards[0];

        Assert.Equal(Preselector137.NominalParts, board.Parts);
        Assert.Equal(Preselector137.Align(Preselector137.NominalParts), board.Trimmers);
    }

    [Fact]
    public void Generate_BadArguments_AreRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => BoardLot.Generate(0));
        Assert.Throws<ArgumentOutOfRangeException>(() => BoardLot.Generate(3, tolerances: new LotTolerances { CoilFraction = -0.1 }));
    }
}
