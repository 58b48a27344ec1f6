using BenchRunner.Execution.Batch;
using BenchRunner.Simulator.Bench;
using BenchRunner.Simulator.Devices;

namespace BenchRunner.Cli.Batch;

/// <summary>
/// The virtual bench's fixture: puts the board of the simulated lot that has the given serial on
/// the simulated network analyser's ports. A serial the lot does not hold leaves the board untested.
/// </summary>
/// <param name="bench">The virtual bench whose network analyser holds the board.</param>
/// <param name="lot">The simulated lot the boards come from.</param>
public sealed class VirtualLotFixture(VirtualBench bench, BoardLot lot) : IBoardFixture
{
    /// <summary>The simulated lot.</summary>
    public BoardLot Lot { get; } = lot ?? throw new ArgumentNullException(nameof(lot));

    /// <inheritdoc/>
    public Task<FixtureResult> PrepareAsync(string serial, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(bench);
        var board = Lot.Boards.FirstOrDefault(b => string.Equals(b.Serial, serial, StringComparison.OrdinalIgnoreCase));
        if (board is null)
        {
            return Task.FromResult(FixtureResult.NotReady(
                $"the virtual lot holds {Lot.Boards[0].Serial} to {Lot.Boards[^1].Serial}, not {serial}"));
        }

        bench.NetworkAnalyser.DeviceUnderTest = board;
        return Task.FromResult(FixtureResult.InPlace);
    }
}
