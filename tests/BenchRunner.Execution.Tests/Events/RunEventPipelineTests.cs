using BenchRunner.Core.Runs;
using BenchRunner.Execution.Events;

namespace BenchRunner.Execution.Tests.Events;

public sealed class RunEventPipelineTests
{
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(30);

    private static OperatorMessage Message(int n) => new(DateTimeOffset.UnixEpoch, $"event {n}");

    [Fact]
    public async Task Publish_EveryListener_GetsEveryEventInOrder()
    {
        await using var pipeline = new RunEventPipeline();
        var first = new Recording();
        var second = new Recording();
        pipeline.Subscribe(first, RunListenerOptions.Lossless("first", capacity: 2));
        pipeline.Subscribe(second, RunListenerOptions.View("second"));

        for (int i = 0; i < 50; i++)
        {
            await pipeline.PublishAsync(Message(i));
        }

        await pipeline.CompleteAsync().WaitAsync(Limit);
        Assert.Equal(Enumerable.Range(0, 50).Select(i => $"event {i}"), first.Texts);
        Assert.Equal(first.Texts, second.Texts);
    }

    [Fact]
    public async Task Publish_AStalledView_NeverHoldsUpTheRunOrTheRecorder()
    {
        await using var pipeline = new RunEventPipeline();
        var recorder = new Recording();
        var stalled = new Gate();
        pipeline.Subscribe(recorder, RunListenerOptions.Recorder(capacity: 4));
        pipeline.Subscribe(stalled, RunListenerOptions.View("stalled view", capacity: 3));

        // 100 events while the view is stuck on the first: publishing completes, the recorder gets all.
        for (int i = 0; i < 100; i++)
        {
            await pipeline.PublishAsync(Message(i)).AsTask().WaitAsync(Limit);
        }

        await recorder.WaitForAsync(100).WaitAsync(Limit);
        stalled.Open();
        await pipeline.CompleteAsync().WaitAsync(Limit);

        Assert.Equal(100, recorder.Texts.Count);
        var view = Assert.Single(pipeline.Reports, r => r.Name == "stalled view");
        // The view keeps the event it was handling and the newest three; the rest were dropped and counted.
        Assert.Equal(100, view.Delivered + view.Dropped);
        Assert.InRange(view.Dropped, 95, 96);
        Assert.Equal("event 99", stalled.Texts[^1]);
    }

    [Fact]
    public async Task Publish_ALosslessListenerAWholeQueueBehind_MakesThePublisherWait()
    {
        await using var pipeline = new RunEventPipeline();
        var slow = new Gate();
        pipeline.Subscribe(slow, RunListenerOptions.Lossless("slow log", capacity: 2));

        await pipeline.PublishAsync(Message(0));           // taken by the listener, which now blocks
        await slow.Entered.WaitAsync(Limit);
        await pipeline.PublishAsync(Message(1));           // queued
        await pipeline.PublishAsync(Message(2));           // queued: the queue is full
        var waiting = pipeline.PublishAsync(Message(3)).AsTask();

        Assert.False(waiting.IsCompleted);
        slow.Open();
        await waiting.WaitAsync(Limit);
        await pipeline.CompleteAsync().WaitAsync(Limit);
        Assert.Equal(["event 0", "event 1", "event 2", "event 3"], slow.Texts);
        Assert.Equal(0, Assert.Single(pipeline.Reports).Dropped);
    }

    [Fact]
    public async Task Publish_AfterTheEssentialListenerFailed_RaisesItsFailure()
    {
        await using var pipeline = new RunEventPipeline();
        var failing = new Failing();
        pipeline.Subscribe(failing, RunListenerOptions.Recorder("result recorder"));

        await pipeline.PublishAsync(Message(0));
        await failing.Failed.WaitAsync(Limit);
        await Until(() => pipeline.Reports[0].Fault is not null);

        var ex = await Assert.ThrowsAsync<RunListenerFailedException>(() => pipeline.PublishAsync(Message(1)).AsTask());
        Assert.Equal("result recorder", ex.Listener);
        Assert.Contains("disk full", ex.Message, StringComparison.Ordinal);
        await Assert.ThrowsAsync<RunListenerFailedException>(pipeline.CompleteAsync);
    }

    [Fact]
    public async Task Publish_AViewThatFails_IsDetachedAndTheRunGoesOn()
    {
        await using var pipeline = new RunEventPipeline();
        var failing = new Failing();
        var recorder = new Recording();
        pipeline.Subscribe(failing, RunListenerOptions.Lossless("broken view", capacity: 1));
        pipeline.Subscribe(recorder, RunListenerOptions.Recorder());

        for (int i = 0; i < 20; i++)
        {
            await pipeline.PublishAsync(Message(i)).AsTask().WaitAsync(Limit);
        }

        await pipeline.CompleteAsync().WaitAsync(Limit);
        Assert.Equal(20, recorder.Texts.Count);
        var report = Assert.Single(pipeline.Reports, r => r.Name == "broken view");
        Assert.IsType<IOException>(report.Fault);
    }

    [Fact]
    public void Subscribe_ACapacityOutOfRange_IsRefused()
    {
        var pipeline = new RunEventPipeline();

        var ex = Assert.Throws<ArgumentException>(() => pipeline.Subscribe(new Recording(), RunListenerOptions.View("view", capacity: 0)));
        Assert.Contains("capacity must be 1 to 1000000", ex.Message, StringComparison.Ordinal);
    }

    /// <summary>Waits for a condition another thread makes true; the limit only guards against a hang.</summary>
    private static async Task Until(Func<bool> condition)
    {
        using var limit = new CancellationTokenSource(Limit);
        while (!condition())
        {
            await Task.Yield();
            limit.Token.ThrowIfCancellationRequested();
        }
    }

    private class Recording : IRunListener
    {
        private readonly List<string> _texts = [];
        private readonly SemaphoreSlim _arrived = new(0);

        public List<string> Texts
        {
            get
            {
                lock (_texts)
                {
                    return [.. _texts];
                }
            }
        }

        public virtual ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
        {
            lock (_texts)
            {
                _texts.Add(((OperatorMessage)runEvent).Text);
            }

            _arrived.Release();
            return ValueTask.CompletedTask;
        }

        public async Task WaitForAsync(int count)
        {
            for (int i = 0; i < count; i++)
            {
                await _arrived.WaitAsync();
            }
        }
    }

    /// <summary>Blocks on the first event until opened.</summary>
    private sealed class Gate : Recording
    {
        private readonly TaskCompletionSource _open = new(TaskCreationOptions.RunContinuationsAsynchronously);
        private readonly TaskCompletionSource _entered = new(TaskCreationOptions.RunContinuationsAsynchronously);

        public Task Entered => _entered.Task;

        public void Open() => _open.TrySetResult();

        public override async ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
        {
            _entered.TrySetResult();
            await _open.Task.WaitAsync(cancellationToken);
            await base.OnEventAsync(runEvent, cancellationToken);
        }
    }

    private sealed class Failing : IRunListener
    {
        private readonly TaskCompletionSource _failed = new(TaskCreationOptions.RunContinuationsAsynchronously);

        public Task Failed => _failed.Task;

        public ValueTask OnEventAsync(RunEvent runEvent, CancellationToken cancellationToken)
        {
            _failed.TrySetResult();
            throw new IOException("disk full");
        }
    }
}
