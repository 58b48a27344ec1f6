using BenchRunner.Daemon.Settings;
using BenchRunner.Instruments.Connections;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Hosting;
using Microsoft.Extensions.Logging;
using Serilog;
using Serilog.Core;
using Serilog.Events;
using Serilog.Formatting.Compact;

namespace BenchRunner.Daemon.Hosting;

/// <summary>
/// Builds and runs the daemon's host: Microsoft.Extensions.Hosting with the daemon as its
/// background worker, Serilog for structured console output and rolling log files, and
/// systemd integration (<c>Type=notify</c>: ready is reported once started, stopping on SIGTERM;
/// outside systemd this changes nothing).
/// </summary>
public static class DaemonHost
{
    /// <summary>The rolling log files' name pattern in the log folder (one file a day, compact JSON lines).</summary>
    public const string LogFilePattern = "benchrunner-.jsonl";

    /// <summary>How many daily log files are kept: 31.</summary>
    public const int LogFilesKept = 31;

    /// <summary>
    /// Runs the daemon until SIGTERM, SIGINT (Ctrl+C) or SIGQUIT; returns once every run in flight
    /// has finished its sweep and been marked stopped (bounded by the settings' stop time).
    /// </summary>
    /// <param name="settings">Checked settings.</param>
    /// <param name="transports">Creates the connections the bench names.</param>
    /// <param name="softwareVersion">BenchRunner's version, recorded with every run.</param>
    /// <param name="extraSink">Another place every log event goes (tests), or null.</param>
    /// <returns>Null when the daemon stopped normally, else what made it fail.</returns>
    public static async Task<Exception?> RunAsync(DaemonSettings settings, TransportFactory transports, string softwareVersion, ILogEventSink? extraSink = null)
    {
        ArgumentNullException.ThrowIfNull(settings);
        using var host = Build(settings, transports, softwareVersion, extraSink);
        var worker = host.Services.GetServices<IHostedService>().OfType<DaemonWorker>().Single();
        await host.RunAsync().ConfigureAwait(false);
        return worker.Failure;
    }

    /// <summary>Builds the host without starting it.</summary>
    public static IHost Build(DaemonSettings settings, TransportFactory transports, string softwareVersion, ILogEventSink? extraSink = null)
    {
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(transports);
        var builder = Host.CreateApplicationBuilder(new HostApplicationBuilderSettings
        {
            // The daemon reads only its own settings (already read); no appsettings.json, no DOTNET_ variables.
            DisableDefaults = true,
            ContentRootPath = settings.Home,
            ApplicationName = "benchrunner",
        });
        builder.Services.AddSystemd();
        builder.Services.Configure<HostOptions>(o =>
        {
            // Long enough for every run to finish its sweep in flight (the daemon bounds that itself).
            o.ShutdownTimeout = settings.StopWithin + TimeSpan.FromSeconds(10);
            o.BackgroundServiceExceptionBehavior = BackgroundServiceExceptionBehavior.StopHost;
        });
        builder.Services.Configure<ConsoleLifetimeOptions>(o => o.SuppressStatusMessages = true);
        builder.Services.AddSerilog(CreateLogger(settings, extraSink), dispose: true);
        builder.Services.AddSingleton(TimeProvider.System);
        builder.Services.AddSingleton(sp => new BenchDaemon(settings, transports, sp.GetRequiredService<TimeProvider>(),
            sp.GetRequiredService<ILoggerFactory>(), softwareVersion));
        builder.Services.AddHostedService<DaemonWorker>();
        return builder.Build();
    }

    /// <summary>The Serilog logger: console (standard error, one line per event) and daily rolling compact-JSON files in the log folder.</summary>
    public static Serilog.Core.Logger CreateLogger(DaemonSettings settings, ILogEventSink? extraSink = null)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var configuration = new LoggerConfiguration()
            .MinimumLevel.Is(ToSerilog(settings.LogLevel))
            .MinimumLevel.Override("Microsoft", LogEventLevel.Warning)
            .Enrich.FromLogContext()
            .WriteTo.Console(
                outputTemplate: "{Timestamp:yyyy-MM-dd HH:mm:ss} {Level:u3} {Message:lj}{NewLine}{Exception}",
                standardErrorFromLevel: LogEventLevel.Verbose,
                formatProvider: System.Globalization.CultureInfo.InvariantCulture)
            .WriteTo.File(new CompactJsonFormatter(), Path.Combine(settings.LogFolder, LogFilePattern),
                rollingInterval: RollingInterval.Day, retainedFileCountLimit: LogFilesKept,
                fileSizeLimitBytes: 64L * 1024 * 1024, rollOnFileSizeLimit: true, flushToDiskInterval: TimeSpan.FromSeconds(2));
        if (extraSink is not null)
        {
            configuration = configuration.WriteTo.Sink(extraSink);
        }

        return configuration.CreateLogger();
    }

    private static LogEventLevel ToSerilog(LogLevel level) => level switch
    {
        LogLevel.Trace => LogEventLevel.Verbose,
        LogLevel.Debug => LogEventLevel.Debug,
        LogLevel.Information => LogEventLevel.Information,
        LogLevel.Warning => LogEventLevel.Warning,
        LogLevel.Error => LogEventLevel.Error,
        _ => LogEventLevel.Fatal,
    };
}
