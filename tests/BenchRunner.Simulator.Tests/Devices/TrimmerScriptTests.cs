using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Simulator.Devices;
using BenchRunner.Simulator.NetworkAnalyser;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Devices;

public class TrimmerScriptTests
{
    private static readonly TrimmerSettings Start = TrimmerSettings.FromPicofarads(2, 4, 2);

    [Fact]
    public void Tuning_StartsAtTheStartOvershootsAndSettlesOnTheTarget()
    {
        var script = TrimmerScript.Tuning(Start, 1, 5, TimeSpan.FromSeconds(20), overshoot: 0.3);

        Assert.Equal(Start, script.At(TimeSpan.Zero));
        Assert.Equal(5 + 0.3, script.At(TimeSpan.FromSeconds(8)).MiddlePicofarads, 12);
        Assert.True(script.At(TimeSpan.FromSeconds(13)).MiddlePicofarads < 5);
        Assert.Equal(5, script.At(TimeSpan.FromSeconds(20)).MiddlePicofarads, 12);
        Assert.Equal(5, script.At(TimeSpan.FromMinutes(5)).MiddlePicofarads, 12);
        Assert.Equal(2, script.At(TimeSpan.FromSeconds(10)).InputPicofarads);
    }

    [Fact]
    public void At_BetweenKeyframes_MovesSmoothlyFromOneToTheNext()
    {
        var script = new TrimmerScript(
        [
            new TrimmerKeyframe(TimeSpan.Zero, Start),
            new TrimmerKeyframe(TimeSpan.FromSeconds(10), Start.With(0, 3)),
        ]);

        Assert.Equal(2.5, script.At(TimeSpan.FromSeconds(5)).InputPicofarads, 12);
        double early = script.At(TimeSpan.FromSeconds(1)).InputPicofarads - 2;
        Assert.InRange(early, 0, 0.1 / 2);
    }

    [Fact]
    public void Keyframes_OutOfOrder_AreRefused()
    {
        Assert.Throws<ArgumentException>(() => new TrimmerScript(
        [
            new TrimmerKeyframe(TimeSpan.FromSeconds(5), Start),
            new TrimmerKeyframe(TimeSpan.FromSeconds(5), Start),
        ]));
        Assert.Throws<ArgumentException>(() => new TrimmerScript([]));
    }

    [Fact]
    public void TuningSession_OnTheVirtualBench_ConvergesToAPassingBoard()
    {
        var clock = new ManualTimeProvider();
        var board = Preselector137.DetunedBoard();
        var target = Preselector137.Align(board.Parts).MiddlePicofarads;
        board.Follow(TrimmerScript.Tuning(board.Trimmers, 1, target, TimeSpan.FromSeconds(20)), clock);
        var analyser = new SimulatedNetworkAnalyser();
        analyser.Configure(new NetworkSweep(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401));
        analyser.DeviceUnderTest = board;
        var mask = MaskFile.Load(RepositoryFiles.Example("psf-137-passband.yaml"));

        var margins = new List<double>();
        for (int second = 0; second <= 24; second += 2)
        {
            var s21 = analyser.Sweep([TraceQuantity.S21])[0];
            margins.Add(mask.Evaluate(s21).WorstMarginDb!.Value);
            clock.Advance(TimeSpan.FromSeconds(2));
        }

        Assert.True(margins[0] < -3, $"starts detuned: {margins[0]} dB");
        Assert.True(margins[^1] > 0.4, $"ends tuned: {margins[^1]} dB");
        Assert.Contains(margins.Skip(3).Take(4), m => m < margins[^1] - 0.3);
        Assert.Equal(target, board.Trimmers.MiddlePicofarads, 12);
    }

    [Fact]
    public void SettingTheTrimmers_StopsTheScript()
    {
        var clock = new ManualTimeProvider();
        var board = Preselector137.TunedBoard();
        board.Follow(TrimmerScript.Tuning(board.Trimmers, 0, 3, TimeSpan.FromSeconds(10)), clock);

        board.Trimmers = Preselector137.TunedTrimmers;
        clock.Advance(TimeSpan.FromSeconds(10));
        board.Snapshot();

        Assert.False(board.FollowingScript);
        Assert.Equal(Preselector137.TunedTrimmers, board.Trimmers);
    }
}
