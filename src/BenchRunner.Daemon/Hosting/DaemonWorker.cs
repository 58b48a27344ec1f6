using Microsoft.Extensions.Hosting;

namespace BenchRunner.Daemon.Hosting;

/// <summary>The hosted worker: runs the <see cref="BenchDaemon"/> until the host stops, then lets it finish gently.</summary>
internal sealed class DaemonWorker(BenchDaemon daemon, IHostApplicationLifetime lifetime) : BackgroundService
{
    /// <summary>Set when the daemon failed (the result database could not be opened, say); the host then stops.</summary>
    public Exception? Failure { get; private set; }

    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        try
        {
            await daemon.RunAsync(stoppingToken).ConfigureAwait(false);
        }
        catch (Exception e) when (e is not OperationCanceledException)
        {
            Failure = e;
            lifetime.StopApplication();
        }
    }
}
