using System.Threading.Channels;
using BenchRunner.Core.Runs;

namespace BenchRunner.Execution.Events;

/// <summary>
/// Carries one run's events from the runner to its listeners without letting a listener stall the
/// run or cost another listener an event. Each listener has its own bounded queue and its own loop;
/// events reach every listener in the order they were published.
/// </summary>
/// <remarks>
/// When a queue is full, <see cref="WhenBehind.Wait"/> makes <see cref="PublishAsync"/> wait for the
/// listener (nothing is lost; the run slows to the listener's pace), while
/// <see cref="WhenBehind.DropOldest"/> drops the oldest queued event and counts it (the run never
/// waits). A listener that throws is detached and its failure noted; if it was essential, the next
/// <see cref="PublishAsync"/> and <see cref="CompleteAsync"/> raise <see cref="RunListenerFailedException"/>.
/// </remarks>
public sealed class RunEventPipeline : IAsyncDisposable
{
    private readonly List<Lane> _lanes = [];
    private readonly CancellationTokenSource _abort = new();
    private bool _completed;

    /// <summary>Adds a listener; its loop starts at once.</summary>
    /// <exception cref="ArgumentException">Invalid options.</exception>
    /// <exception cref="InvalidOperationException">The pipeline is already completed.</exception>
    public void Subscribe(IRunListener listener, RunListenerOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(listener);
        options ??= new RunListenerOptions();
        if (options.Problems() is { Count: > 0 } problems)
        {
            throw new ArgumentException(string.Join("; ", problems), nameof(options));
        }

        ObjectDisposedException.ThrowIf(_completed, this);
        lock (_lanes)
        {
            _lanes.Add(new Lane(listener, options, _abort.Token));
        }
    }

    /// <summary>How each listener has fared so far.</summary>
    public IReadOnlyList<ListenerReport> Reports
    {
        get
        {
            lock (_lanes)
            {
                return [.. _lanes.Select(l => l.Report())];
            }
        }
    }

    /// <summary>
    /// Queues <paramref name="runEvent"/> for every listener. Completes at once unless a
    /// <see cref="WhenBehind.Wait"/> listener's queue is full.
    /// </summary>
    /// <exception cref="RunListenerFailedException">An essential listener has failed.</exception>
    public async ValueTask PublishAsync(RunEvent runEvent)
    {
        ArgumentNullException.ThrowIfNull(runEvent);
        foreach (var lane in Snapshot())
        {
            await lane.WriteAsync(runEvent).ConfigureAwait(false);
        }
    }

    /// <summary>Ends the stream: waits until every listener has handled every queued event.</summary>
    /// <exception cref="RunListenerFailedException">An essential listener failed.</exception>
    public async Task CompleteAsync()
    {
        _completed = true;
        var lanes = Snapshot();
        foreach (var lane in lanes)
        {
            lane.Complete();
        }

        await Task.WhenAll(lanes.Select(l => l.Loop)).ConfigureAwait(false);
        foreach (var lane in lanes)
        {
            lane.ThrowIfEssentialFailed();
        }
    }

    /// <summary>Stops every listener loop at once, dropping what is queued (use <see cref="CompleteAsync"/> first for an orderly end).</summary>
    public async ValueTask DisposeAsync()
    {
        _completed = true;
        var lanes = Snapshot();
        foreach (var lane in lanes)
        {
            lane.Complete();
        }

        await _abort.CancelAsync().ConfigureAwait(false);
        try
        {
            await Task.WhenAll(lanes.Select(l => l.Loop)).ConfigureAwait(false);
        }
        catch (OperationCanceledException)
        {
            // The loops were told to stop.
        }

        _abort.Dispose();
    }

    private List<Lane> Snapshot()
    {
        lock (_lanes)
        {
            return [.. _lanes];
        }
    }

    private sealed class Lane
    {
        private readonly IRunListener _listener;
        private readonly RunListenerOptions _options;
        private readonly Channel<RunEvent> _queue;
        private long _delivered;
        private long _dropped;
        private volatile Exception? _fault;

        public Lane(IRunListener listener, RunListenerOptions options, CancellationToken abort)
        {
            _listener = listener;
            _options = options;
            var wait = options.Essential || options.WhenBehind == WhenBehind.Wait;
            _queue = Channel.CreateBounded<RunEvent>(
                new BoundedChannelOptions(options.Capacity)
                {
                    SingleReader = true,
                    FullMode = wait ? BoundedChannelFullMode.Wait : BoundedChannelFullMode.DropOldest,
                },
                _ => Interlocked.Increment(ref _dropped));
            Loop = Task.Run(() => RunAsync(abort), CancellationToken.None);
        }

        public Task Loop { get; }

        public async ValueTask WriteAsync(RunEvent runEvent)
        {
            ThrowIfEssentialFailed();
            if (_fault is not null)
            {
                return;
            }

            try
            {
                await _queue.Writer.WriteAsync(runEvent).ConfigureAwait(false);
            }
            catch (ChannelClosedException)
            {
                ThrowIfEssentialFailed();
            }
        }

        public void Complete() => _queue.Writer.TryComplete();

        public void ThrowIfEssentialFailed()
        {
            if (_options.Essential && _fault is { } fault)
            {
                throw new RunListenerFailedException(_options.Name, fault);
            }
        }

        public ListenerReport Report() => new(_options.Name, Interlocked.Read(ref _delivered), Interlocked.Read(ref _dropped), _fault);

        private async Task RunAsync(CancellationToken abort)
        {
            await foreach (var runEvent in _queue.Reader.ReadAllAsync(abort).ConfigureAwait(false))
            {
                if (_fault is not null)
                {
                    continue; // detached: keep draining so a waiting publisher is never blocked
                }

                try
                {
                    await _listener.OnEventAsync(runEvent, abort).ConfigureAwait(false);
                    Interlocked.Increment(ref _delivered);
                }
                catch (OperationCanceledException) when (abort.IsCancellationRequested)
                {
                    throw;
                }
                catch (Exception ex)
                {
                    _fault = ex;
                    if (_options.Essential)
                    {
                        // Writers now fail at once and see the fault; what is queued is drained unseen.
                        _queue.Writer.TryComplete();
                    }
                }
            }
        }
    }
}
