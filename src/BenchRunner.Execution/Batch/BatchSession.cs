using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Storage;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Batch;

/// <summary>
/// Tests the boards of one lot, one at a time, against one plan: puts each board in the fixture,
/// runs the plan as a batch run of the lot, and flags a board that already has a verdict as a
/// retest (its history is kept; the latest verdict counts). A board the fixture cannot provide,
/// or whose run is stopped or cannot finish, is left untested: it gets no verdict.
/// </summary>
public sealed class BatchSession
{
    private readonly RunLauncher _runner;
    private readonly TestPlan _plan;
    private readonly RunContext _context;
    private readonly IResultReader _store;
    private readonly IBoardFixture _fixture;

    /// <summary>Creates a session.</summary>
    /// <param name="runner">Runs the plan and records each run (into the store that <paramref name="history"/> reads).</param>
    /// <param name="plan">The validated plan every board is tested with.</param>
    /// <param name="context">The record kept with every run; its serial, mode and retest flag are set per board.</param>
    /// <param name="history">The results: they hold the lot's history, which decides what is a retest.</param>
    /// <param name="fixture">Puts each board in place.</param>
    /// <exception cref="ArgumentException">A context without a lot.</exception>
    public BatchSession(RunLauncher runner, TestPlan plan, RunContext context, IResultReader history, IBoardFixture fixture)
    {
        _runner = runner ?? throw new ArgumentNullException(nameof(runner));
        _plan = plan ?? throw new ArgumentNullException(nameof(plan));
        _context = context ?? throw new ArgumentNullException(nameof(context));
        _store = history ?? throw new ArgumentNullException(nameof(history));
        _fixture = fixture ?? throw new ArgumentNullException(nameof(fixture));
        if (string.IsNullOrWhiteSpace(context.Lot))
        {
            throw new ArgumentException("A batch needs a lot.", nameof(context));
        }
    }

    /// <summary>The lot being tested.</summary>
    public string Lot => _context.Lot!;

    /// <summary>True when <paramref name="serial"/> already has a verdict (a passed or failed single or batch run) in the store.</summary>
    public async Task<bool> HasVerdictAsync(string serial, CancellationToken cancellationToken = default) =>
        (await _store.ListRunsAsync(new RunFilter { DutSerial = serial }, cancellationToken).ConfigureAwait(false))
            .Any(r => r.Record.Mode != RunMode.Tuning && r.Status is RunStatus.Passed or RunStatus.Failed);

    /// <summary>
    /// Tests one board. Cancellation during the run stops it: the run is recorded as stopped and the
    /// board left untested; the caller sees the token cancelled and ends the batch.
    /// </summary>
    /// <param name="serial">The board's serial, as <see cref="BoardSerial.TryRead"/> accepts it.</param>
    /// <param name="listeners">See the run's events (views, logs), or null.</param>
    /// <param name="cancellationToken">Stops the board's test.</param>
    /// <exception cref="OperationCanceledException">Cancelled while the fixture was getting the board ready.</exception>
    /// <exception cref="ArgumentException">Not a serial.</exception>
    public async Task<BoardResult> TestAsync(string serial, IEnumerable<RunSubscription>? listeners, CancellationToken cancellationToken)
    {
        if (!BoardSerial.TryRead(serial, out var clean, out var problem))
        {
            throw new ArgumentException(problem, nameof(serial));
        }

        // A quick local read: a stop asked for now takes effect in the run, which records it.
        bool retest = await HasVerdictAsync(clean!, CancellationToken.None).ConfigureAwait(false);
        var ready = await _fixture.PrepareAsync(clean!, cancellationToken).ConfigureAwait(false);
        if (!ready.Ready)
        {
            return new BoardResult(clean!, retest, null, ready.Reason);
        }

        var context = _context with { DutSerial = clean, IsRetest = retest, Mode = RunMode.Batch };
        var outcome = await _runner.RunAsync(_plan, context, listeners, cancellationToken).ConfigureAwait(false);
        var reason = outcome.Status switch
        {
            RunStatus.Passed or RunStatus.Failed => null,
            RunStatus.Stopped => "the test was stopped by the operator",
            _ => $"the test could not finish: {outcome.Error}",
        };
        return new BoardResult(clean!, retest, outcome, reason);
    }
}
