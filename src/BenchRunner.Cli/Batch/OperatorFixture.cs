using BenchRunner.Execution.Batch;

namespace BenchRunner.Cli.Batch;

/// <summary>
/// A real bench's fixture: asks the operator to connect the board and press Enter; typing
/// <see cref="SkipWord"/> (or ending the input) leaves the board untested.
/// </summary>
/// <param name="input">What the operator types.</param>
/// <param name="prompt">Where the request is written.</param>
/// <param name="echo">Write each answer after the request (when the input is not a terminal, which would show it).</param>
public sealed class OperatorFixture(TextReader input, TextWriter prompt, bool echo = false) : IBoardFixture
{
    /// <summary>The word that leaves a board untested.</summary>
    public const string SkipWord = "skip";

    /// <inheritdoc/>
    public async Task<FixtureResult> PrepareAsync(string serial, CancellationToken cancellationToken)
    {
        prompt.Write($"Connect board {serial} to the bench, then press Enter (or type {SkipWord} to leave it untested): ");
        prompt.Flush();
        // Console input reads synchronously and cannot be interrupted: read on the pool and stop waiting on Ctrl+C.
        var answer = await Task.Run(input.ReadLine, CancellationToken.None).WaitAsync(cancellationToken).ConfigureAwait(false);
        if (echo)
        {
            prompt.WriteLine(answer ?? "");
        }

        return answer switch
        {
            null => FixtureResult.NotReady("the input ended before the board was confirmed as connected"),
            _ when answer.Trim().Equals(SkipWord, StringComparison.OrdinalIgnoreCase) => FixtureResult.NotReady("left untested by the operator"),
            _ => FixtureResult.InPlace,
        };
    }
}
