using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Devices;

namespace BenchRunner.Simulator.Tests.Bench;

public sealed class TuningDemoTests
{
    [Fact]
    public void Board_FollowsTheHandFromTheDetunedToTheAlignedMiddleTrimmer()
    {
        var clock = new ManualTimeProvider();
        var board = TuningDemo.Board(clock, TimeSpan.FromSeconds(10));
        var aligned = Preselector137.Align(Preselector137.NominalParts);

        board.Snapshot();
        Assert.Equal(Preselector137.DetunedTrimmers, board.Trimmers);

        // At 40 % of the turn the hand is 30 % past the aligned setting (TrimmerScript.Tuning).
        clock.Advance(TimeSpan.FromSeconds(4));
        board.Snapshot();
        double distance = aligned.MiddlePicofarads - Preselector137.DetunedTrimmers.MiddlePicofarads;
        Assert.Equal(aligned.MiddlePicofarads + 0.3 * distance, board.Trimmers.MiddlePicofarads, 9);

        clock.Advance(TimeSpan.FromSeconds(7));
        board.Snapshot();
        Assert.Equal(aligned.MiddlePicofarads, board.Trimmers.MiddlePicofarads, 9);
        // Only the middle trimmer moves.
        Assert.Equal(Preselector137.DetunedTrimmers.InputPicofarads, board.Trimmers.InputPicofarads);
        Assert.Equal(Preselector137.DetunedTrimmers.OutputPicofarads, board.Trimmers.OutputPicofarads);
    }

    [Fact]
    public void CreateBench_PutsTheFollowingBoardOnTheNetworkAnalyser()
    {
        var bench = TuningDemo.CreateBench(seed: 1, new ManualTimeProvider());

        var board = Assert.IsType<PreselectorBoard>(bench.NetworkAnalyser.DeviceUnderTest);
        Assert.Equal("PSF-24-0002", board.Serial);
        Assert.True(board.FollowingScript);
    }
}
