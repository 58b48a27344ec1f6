using BenchRunner.Simulator.Devices;

namespace BenchRunner.Simulator.Bench;

/// <summary>
/// The tuning demo on the virtual bench: the detuned preselector board PSF-24-0002 on the network
/// analyser, and a virtual technician turning its middle trimmer from the detuned setting to the
/// aligned one (going past it and back, as a hand does; see <see cref="TrimmerScript.Tuning"/>).
/// The hand moves against the given clock, so tests can drive it with a fake one.
/// </summary>
public static class TuningDemo
{
    /// <summary>The trimmer the virtual technician turns: 1, the middle one.</summary>
    public const int TurnedTrimmer = 1;

    /// <summary>How long the virtual technician takes by default: 20 s.</summary>
    public static TimeSpan DefaultTurnTime { get; } = TimeSpan.FromSeconds(20);

    /// <summary>
    /// The hand on the trimmer: from <see cref="Preselector137.DetunedTrimmers"/>, the middle trimmer
    /// to its aligned setting (<see cref="Preselector137.Align"/> of the nominal parts) in
    /// <paramref name="turnTime"/>, overshooting by the default 30 %.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="turnTime"/> not above zero.</exception>
    public static TrimmerScript Script(TimeSpan turnTime)
    {
        var aligned = Preselector137.Align(Preselector137.NominalParts);
        return TrimmerScript.Tuning(Preselector137.DetunedTrimmers, TurnedTrimmer, aligned[TurnedTrimmer], turnTime);
    }

    /// <summary>The detuned board PSF-24-0002, already following <see cref="Script"/> from now on <paramref name="clock"/>.</summary>
    public static PreselectorBoard Board(TimeProvider clock, TimeSpan? turnTime = null)
    {
        var board = Preselector137.DetunedBoard();
        board.Follow(Script(turnTime ?? DefaultTurnTime), clock);
        return board;
    }

    /// <summary>The demo bench (<see cref="VirtualBench.CreateDemo"/>) with <see cref="Board"/> on its network analyser.</summary>
    /// <param name="seed">Seeds the analysers' noise.</param>
    /// <param name="clock">The clock the virtual hand moves by.</param>
    /// <param name="turnTime">How long the hand takes; <see cref="DefaultTurnTime"/> when null.</param>
    public static VirtualBench CreateBench(int seed, TimeProvider clock, TimeSpan? turnTime = null)
    {
        var bench = VirtualBench.CreateDemo(seed);
        bench.NetworkAnalyser.DeviceUnderTest = Board(clock, turnTime);
        return bench;
    }
}
