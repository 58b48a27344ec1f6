using System.Collections.Concurrent;
using BenchRunner.Daemon.Hosting;
using BenchRunner.Daemon.Settings;
using BenchRunner.Daemon.Status;
using BenchRunner.Daemon.Work;
using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Tests.Support;

/// <summary>
/// A daemon running in-process against the virtual bench, in a temporary home folder, with quick
/// timings. Waits are event-driven with generous limits, so a loaded machine only makes them slower.
/// </summary>
internal sealed class DaemonRig : IAsyncDisposable
{
    public static readonly TimeSpan Patience = TimeSpan.FromSeconds(90);

    private readonly CancellationTokenSource _stop = new();
    private readonly ConcurrentQueue<FinishedJobStatus> _finished = new();
    private readonly LoggerFactory _logs;
    private Task? _running;
    private event Action? Changed;

    public DaemonRig(SwitchableBench? bench = null, Func<DaemonSettings, DaemonSettings>? adjust = null)
    {
        Bench = bench ?? new SwitchableBench();
        Settings = DaemonSettingsLoader.Load(new CommandLineSettings { Home = Folder.Path, Bench = RepositoryFiles.Example("bench-virtual.yaml") },
            new Dictionary<string, string>(), Folder.Path) with
        {
            Settle = TimeSpan.FromMilliseconds(200),
            ScanEvery = TimeSpan.FromMilliseconds(100),
            StopWithin = TimeSpan.FromSeconds(30),
            RetryFirst = TimeSpan.FromMilliseconds(200),
            RetryLongest = TimeSpan.FromSeconds(1),
        };
        Settings = adjust?.Invoke(Settings) ?? Settings;
        _logs = new LoggerFactory([Log]);
        Daemon = new BenchDaemon(Settings, Bench.Transports(), TimeProvider.System, _logs, "0.1.0-test");
        Daemon.JobFinished += f =>
        {
            _finished.Enqueue(f);
            Changed?.Invoke();
        };
        Daemon.Leases.Changed += c =>
        {
            LeaseChanges.Enqueue(c);
            Changed?.Invoke();
        };
    }

    public TempDirectory Folder { get; } = new();

    public SwitchableBench Bench { get; }

    public DaemonSettings Settings { get; }

    public BenchDaemon Daemon { get; }

    public CollectingLoggerProvider Log { get; } = new();

    public ConcurrentQueue<LeaseChange> LeaseChanges { get; } = new();

    public IReadOnlyList<FinishedJobStatus> Finished => [.. _finished];

    public void Start() => _running = Task.Run(() => Daemon.RunAsync(_stop.Token));

    /// <summary>Drops a plan into the inbox the safe way: written under a temporary name, then renamed.</summary>
    public string Drop(string fileName, string text)
    {
        var temporary = Path.Combine(Settings.InboxFolder, fileName + ".part");
        File.WriteAllText(temporary, text);
        var path = Path.Combine(Settings.InboxFolder, fileName);
        File.Move(temporary, path);
        return path;
    }

    /// <summary>Waits until <paramref name="condition"/> holds, re-checking whenever a job finishes or a lease changes, and every 50 ms.</summary>
    public async Task WaitUntilAsync(Func<bool> condition, string what)
    {
        var deadline = DateTime.UtcNow + Patience;
        while (!condition())
        {
            if (DateTime.UtcNow > deadline)
            {
                throw new TimeoutException($"Waited {Patience.TotalSeconds} s for {what}. Log:\n" + string.Join("\n", Log.Events.Select(e => e.Message)));
            }

            if (_running is { IsFaulted: true })
            {
                await _running;
            }

            var signal = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
            void OnChange() => signal.TrySetResult();
            Changed += OnChange;
            try
            {
                await Task.WhenAny(signal.Task, Task.Delay(50));
            }
            finally
            {
                Changed -= OnChange;
            }
        }
    }

    public async Task<FinishedJobStatus> WaitForFinishedAsync(string plan)
    {
        await WaitUntilAsync(() => Finished.Any(f => f.Plan == plan), $"plan {plan} to finish");
        return Finished.First(f => f.Plan == plan);
    }

    /// <summary>Stops the daemon as SIGTERM would and waits for it to return.</summary>
    public async Task StopAsync()
    {
        _stop.Cancel();
        if (_running is not null)
        {
            await _running.WaitAsync(Patience);
        }
    }

    public async ValueTask DisposeAsync()
    {
        try
        {
            await StopAsync();
        }
        finally
        {
            _logs.Dispose();
            _stop.Dispose();
            Folder.Dispose();
        }
    }
}
