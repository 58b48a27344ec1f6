using BenchRunner.Core.Figures;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.TraceFiles;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Circuits;
using BenchRunner.Simulator.Devices;

namespace BenchRunner.Simulator.Tests.Devices;

/// <summary>
/// The simulated preselector against the bundled example traces (docs/examples, made by
/// scripts/make-example-traces.py from the same circuit without parasitics) and the example mask.
/// </summary>
public class PreselectorTests
{
    private static readonly FrequencyAxis ExampleAxis = FrequencyAxis.Linear(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401);

    private static Trace ExampleS21(string name) => TraceFile.Read(RepositoryFiles.Example(name)).Find(TraceQuantity.S21)!;

    private static Trace S21Of(ITwoPort board) => board.Sweep(ExampleAxis, [TraceQuantity.S21])[0];

    private static LimitMask PassbandMask => MaskFile.Load(RepositoryFiles.Example("psf-137-passband.yaml"));

    [Fact]
    public void TunedBoard_HasTheFiguresOfExamplePsf240001()
    {
        var simulated = S21Of(Preselector137.TunedBoard());
        var example = ExampleS21("psf-24-0001.s2p");

        var bw = TraceFigures.Bandwidth(simulated).Value;
        var exampleBw = TraceFigures.Bandwidth(example).Value;

        // The example's own figures (printed by the script): centre 137.561 MHz, −3 dB width 3.121 MHz, loss 2.49 dB.
        Assert.Equal(exampleBw.Centre.Megahertz, bw.Centre.Megahertz, 0.02);
        Assert.Equal(exampleBw.Width.Megahertz, bw.Width.Megahertz, 0.03);
        Assert.Equal(TraceFigures.InsertionLoss(example).Value, TraceFigures.InsertionLoss(simulated).Value, 0.05);
        Assert.InRange(bw.Centre.Megahertz, 137.53, 137.59);
        Assert.InRange(bw.Width.Megahertz, 3.07, 3.17);
    }

    [Fact]
    public void TunedBoard_FollowsExamplePsf240001PointByPoint()
    {
        var simulated = S21Of(Preselector137.TunedBoard());
        var example = ExampleS21("psf-24-0001.s2p");

        for (int i = 0; i < ExampleAxis.Count; i++)
        {
            // Close in the passband and its skirts; in the deep stop band the parasitics may differ more.
            double tolerance = example.LevelsDb[i] > -20 ? 0.15 : 0.5;
            Assert.True(Math.Abs(simulated.LevelsDb[i] - example.LevelsDb[i]) <= tolerance,
                $"{ExampleAxis[i]}: simulated {simulated.LevelsDb[i]:F3} dB, example {example.LevelsDb[i]:F3} dB");
        }
    }

    [Fact]
    public void DetunedBoard_HasTheFiguresOfExamplePsf240002()
    {
        var simulated = S21Of(Preselector137.DetunedBoard());
        var example = ExampleS21("psf-24-0002.s2p");

        Assert.Equal(TraceFigures.Bandwidth(example).Value.Centre.Megahertz, TraceFigures.Bandwidth(simulated).Value.Centre.Megahertz, 0.05);
        Assert.Equal(TraceFigures.InsertionLoss(example).Value, TraceFigures.InsertionLoss(simulated).Value, 0.1);
    }

    [Fact]
    public void ExampleMask_PassesTheTunedBoardAndFailsTheDetunedOne()
    {
        var tuned = PassbandMask.Evaluate(S21Of(Preselector137.TunedBoard()));
        var detuned = PassbandMask.Evaluate(S21Of(Preselector137.DetunedBoard()));

        Assert.True(tuned.Passed, $"worst margin {tuned.WorstMarginDb} dB at {tuned.WorstMarginAt}");
        Assert.False(detuned.Passed);
        Assert.True(detuned.WorstMarginDb < -3, $"worst margin {detuned.WorstMarginDb} dB");
    }

    [Fact]
    public void Align_WithoutParasitics_GivesTheScriptsTrimmerSettings()
    {
        // scripts/make-example-traces.py prints "fixed 22 pF + trimmers 2.24, 5.57, 2.24 pF" for the
        // parasitic-free circuit, aligned by the same rule.
        var bare = Preselector137.NominalParts with
        {
            Input = new ResonatorParts(47e-9, 300, 0, 22e-12),
            Middle = new ResonatorParts(47e-9, 300, 0, 22e-12),
            Output = new ResonatorParts(47e-9, 300, 0, 22e-12),
            TrimmerEsrOhms = 0,
            TrimmerEslHenries = 0,
            ChipEsrOhms = 0,
            ChipEslHenries = 0,
        };

        var trimmers = Preselector137.Align(bare);

        Assert.Equal(2.24, trimmers.InputPicofarads, 0.005);
        Assert.Equal(5.57, trimmers.MiddlePicofarads, 0.005);
        Assert.Equal(2.24, trimmers.OutputPicofarads, 0.005);
    }

    [Fact]
    public void Align_NeverLeavesTheTrimmersTravel()
    {
        var bigCoils = Preselector137.NominalParts with { Input = Preselector137.NominalParts.Input with { CoilHenries = 56e-9 } };

        var trimmers = Preselector137.Align(bigCoils);

        Assert.Equal(Preselector137.TrimmerMinimumPicofarads, trimmers.InputPicofarads);
        Assert.True(Preselector137.WithinTravel(trimmers));
    }

    [Fact]
    public void Board_TrimmerOutsideTravel_IsRefused()
    {
        var board = Preselector137.TunedBoard();

        Assert.Throws<ArgumentOutOfRangeException>(() => board.Trimmers = board.Trimmers.With(1, 12));
        Assert.Throws<ArgumentOutOfRangeException>(() => new PreselectorBoard("PSF-24-0099", Preselector137.NominalParts, TrimmerSettings.FromPicofarads(0.5, 5, 2)));
    }

    [Fact]
    public void Board_SettingATrimmer_ChangesTheResponse()
    {
        var board = Preselector137.TunedBoard();
        var before = S21Of(board);

        board.Trimmers = board.Trimmers.With(1, board.Trimmers.MiddlePicofarads - Preselector137.ExampleDetuningPicofarads);

        Assert.True(S21Of(board).LevelsDb[200] < before.LevelsDb[200] - 2);
    }

    [Fact]
    public void FarStopBand_ChipSelfResonanceNotchesAndRejectionComesBackAboveIt()
    {
        // The shunt 22 pF chips series-resonate with their ESL at 1/(2π√(0.4 nH·22 pF)) ≈ 1.70 GHz and
        // short the line; above that they are inductive and the rejection comes back up, where ideal
        // parts would keep falling.
        var ideal = Preselector137.NominalParts with
        {
            Input = Preselector137.NominalParts.Input with { CoilSelfFarads = 0 },
            Middle = Preselector137.NominalParts.Middle with { CoilSelfFarads = 0 },
            Output = Preselector137.NominalParts.Output with { CoilSelfFarads = 0 },
            TrimmerEslHenries = 0,
            ChipEslHenries = 0,
        };
        var trimmers = Preselector137.TunedTrimmers;
        var real = Preselector137.BuildNetwork(Preselector137.NominalParts, trimmers);
        var idealBoard = Preselector137.BuildNetwork(ideal, trimmers);
        double chipResonance = new Capacitor(22e-12, eslHenries: 0.4e-9).SelfResonantFrequency!.Value.Hertz;
        double Db(Network n, double hz) => 20 * Math.Log10(n.Evaluate(hz, 50).S21.Magnitude);

        Assert.True(Db(real, chipResonance) < Db(idealBoard, chipResonance) - 40);
        Assert.True(Db(real, 3e9) > Db(real, chipResonance) + 60);
        Assert.True(Db(real, 3e9) > Db(idealBoard, 3e9) + 20);
    }
}
