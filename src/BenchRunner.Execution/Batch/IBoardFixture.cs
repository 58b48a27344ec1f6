namespace BenchRunner.Execution.Batch;

/// <summary>
/// Puts a board into the test fixture before it is tested. On the virtual bench this swaps the
/// simulated board; on a real bench it asks the operator to connect the board and confirm.
/// </summary>
public interface IBoardFixture
{
    /// <summary>Gets the board <paramref name="serial"/> ready for testing.</summary>
    /// <returns>Whether it is ready; when not, why (the board is then left untested).</returns>
    Task<FixtureResult> PrepareAsync(string serial, CancellationToken cancellationToken);
}
