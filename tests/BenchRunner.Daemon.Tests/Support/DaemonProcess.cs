using System.Diagnostics;
using System.Runtime.InteropServices;

namespace BenchRunner.Daemon.Tests.Support;

/// <summary>The built <c>benchrunner serve</c> running as its own process, its log lines (standard error) collected.</summary>
internal sealed partial class DaemonProcess : IDisposable
{
    private const int SigTerm = 15;

    private readonly Process _process;
    private readonly List<string> _lines = [];
    private readonly SemaphoreSlim _newLine = new(0);

    private DaemonProcess(Process process) => _process = process;

    public static DaemonProcess Start(string home, string bench)
    {
        var info = new ProcessStartInfo("dotnet")
        {
            RedirectStandardError = true,
            RedirectStandardOutput = true,
            UseShellExecute = false,
        };
        foreach (var argument in new[] { Path.Combine(AppContext.BaseDirectory, "benchrunner.dll"), "serve", "--home", home, "--bench", bench })
        {
            info.ArgumentList.Add(argument);
        }

        var process = new Process { StartInfo = info, EnableRaisingEvents = true };
        var daemon = new DaemonProcess(process);
        process.ErrorDataReceived += (_, e) =>
        {
            if (e.Data is not null)
            {
                lock (daemon._lines)
                {
                    daemon._lines.Add(e.Data);
                }

                daemon._newLine.Release();
            }
        };
        process.OutputDataReceived += (_, _) => { };
        process.Start();
        process.BeginErrorReadLine();
        process.BeginOutputReadLine();
        return daemon;
    }

    public IReadOnlyList<string> Lines
    {
        get
        {
            lock (_lines)
            {
                return [.. _lines];
            }
        }
    }

    public int Count(string text) => Lines.Count(l => l.Contains(text, StringComparison.Ordinal));

    /// <summary>Waits (generously) until at least <paramref name="count"/> log lines contain <paramref name="text"/>.</summary>
    public async Task WaitForLinesAsync(string text, int count = 1)
    {
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(120);
        while (Count(text) < count)
        {
            if (_process.HasExited)
            {
                throw new InvalidOperationException($"The daemon exited ({_process.ExitCode}) before logging \"{text}\":\n{string.Join("\n", Lines)}");
            }

            if (DateTime.UtcNow > deadline)
            {
                throw new TimeoutException($"No \"{text}\" (x{count}) in the daemon's log:\n{string.Join("\n", Lines)}");
            }

            await _newLine.WaitAsync(TimeSpan.FromMilliseconds(200));
        }
    }

    /// <summary>Sends SIGTERM, as systemd does on stop.</summary>
    public void Terminate() => Assert.Equal(0, SendSignal(_process.Id, SigTerm));

    /// <summary>Kills the process outright (SIGKILL): nothing of it runs afterwards.</summary>
    public void KillHard() => _process.Kill(entireProcessTree: true);

    public async Task<int> WaitForExitAsync()
    {
        await _process.WaitForExitAsync().WaitAsync(TimeSpan.FromSeconds(120));
        return _process.ExitCode;
    }

    public void Dispose()
    {
        if (!_process.HasExited)
        {
            _process.Kill(entireProcessTree: true);
        }

        _process.Dispose();
        _newLine.Dispose();
    }

    [LibraryImport("libc", EntryPoint = "kill", SetLastError = true)]
    private static partial int SendSignal(int pid, int signal);
}
