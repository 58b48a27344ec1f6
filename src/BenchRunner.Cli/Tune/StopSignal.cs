using System.Runtime.InteropServices;

namespace BenchRunner.Cli.Tune;

/// <summary>
/// Turns Ctrl+C (SIGINT) and SIGTERM into a cancellation while a long session runs, so that the
/// session ends cleanly (its run marked stopped, every sweep kept) instead of the process being
/// killed mid-write. Linked to the token the command line already gives.
/// </summary>
public sealed class StopSignal : IDisposable
{
    private readonly CancellationTokenSource _source;
    private readonly List<PosixSignalRegistration> _registrations = [];

    /// <summary>Starts listening; <see cref="Token"/> also fires with <paramref name="outer"/>.</summary>
    public StopSignal(CancellationToken outer)
    {
        _source = CancellationTokenSource.CreateLinkedTokenSource(outer);
        foreach (var signal in new[] { PosixSignal.SIGINT, PosixSignal.SIGTERM })
        {
            _registrations.Add(PosixSignalRegistration.Create(signal, context =>
            {
                // Keep the process alive: the session stops at once and finishes its run.
                context.Cancel = true;
                _source.Cancel();
            }));
        }
    }

    /// <summary>Fires on the first Ctrl+C or SIGTERM, or with the outer token.</summary>
    public CancellationToken Token => _source.Token;

    /// <inheritdoc/>
    public void Dispose()
    {
        foreach (var registration in _registrations)
        {
            registration.Dispose();
        }

        _source.Dispose();
    }
}
