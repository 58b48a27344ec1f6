using BenchRunner.Execution.Batch;

namespace BenchRunner.Cli.Batch;

/// <summary>
/// A real bench's fixture: asks the operator to connect the board and press Enter; typing
/// <see cref="SkipWord"/> (or ending the input) leaves the board untested.
/// </summary>
/// <param name="input">What the operator types.</param>
/// <param name="prompt">Where the request is written.</param>
public sealed class OperatorFixture(TextReader input, TextWriter prompt) : IBoardFixture
{
    /// <summary>The word that leaves a board untested.</summary>
    public const string SkipWord = "skip";

    /// <inheritdoc/>
    public async Task<FixtureResult> PrepareAsync(string serial, CancellationToken cancellationToken)
    {
        prompt.Write($"Connect board {serial} to the bench, then press Enter (or type {SkipWord} to leave it untested): ");
        prompt.Flush();
        var answer = await input.ReadLineAsync(cancellationToken).AsTask().WaitAsync(cancellationToken).ConfigureAwait(false);
        return answer switch
        {
            null => FixtureResult.NotReady("the input ended before the board was confirmed as connected"),
            _ when answer.Trim().Equals(SkipWord, StringComparison.OrdinalIgnoreCase) => FixtureResult.NotReady("left untested by the operator"),
            _ => FixtureResult.InPlace,
        };
    }
}
