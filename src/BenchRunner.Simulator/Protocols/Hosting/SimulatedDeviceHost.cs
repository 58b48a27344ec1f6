using System.Text;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Simulator.Protocols.Hosting;

/// <summary>
/// Serves one simulated instrument's <see cref="IDeviceProtocol"/> over device-end transports: reads
/// command lines, hands each to the protocol and writes back what it returns, until the peer closes
/// the connection or the cancellation token fires. A listener (TCP, pseudo-terminal, in-memory) calls
/// <see cref="ServeAsync"/> once per accepted connection; several connections may be served at once,
/// and their lines are handled one at a time, as by a single instrument.
/// <para>
/// Bad input never ends a session: the protocol answers it with its own error, and a line longer than
/// <see cref="SimulatedDeviceHostOptions.MaxLineBytes"/> is discarded and answered by
/// <see cref="IDeviceProtocol.HandleOverlongLine"/>. An exception thrown by the protocol or the model
/// behind it (a defect, not bad input) ends that session: the connection is closed and the task faults.
/// </para>
/// </summary>
public sealed class SimulatedDeviceHost
{
    private const int ReadChunkBytes = 4096;

    private readonly Lock _gate = new();
    private readonly int _maxLineBytes;

    /// <summary>Creates a host for <paramref name="protocol"/>.</summary>
    /// <param name="protocol">The instrument's protocol; one instance for all its connections.</param>
    /// <param name="options">Line-length limit; defaults when null.</param>
    /// <exception cref="ArgumentException">Invalid options.</exception>
    public SimulatedDeviceHost(IDeviceProtocol protocol, SimulatedDeviceHostOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(protocol);
        var chosen = options ?? new SimulatedDeviceHostOptions();
        chosen.Validate();
        Protocol = protocol;
        _maxLineBytes = chosen.MaxLineBytes;
    }

    /// <summary>The protocol served.</summary>
    public IDeviceProtocol Protocol { get; }

    /// <summary>
    /// Serves <paramref name="connection"/> (opened here when it is not open yet) until the peer
    /// closes it, the link fails or <paramref name="cancellationToken"/> fires; then closes it.
    /// </summary>
    /// <returns>Why serving stopped.</returns>
    /// <exception cref="Exception">Whatever the protocol threw on a defect; the connection is closed first.</exception>
    public async Task<DeviceSessionEnd> ServeAsync(ITransport connection, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(connection);
        try
        {
            await connection.OpenAsync(cancellationToken).ConfigureAwait(false);
            return await PumpAsync(connection, cancellationToken).ConfigureAwait(false);
        }
        catch (OperationCanceledException) when (cancellationToken.IsCancellationRequested)
        {
            return DeviceSessionEnd.Stopped;
        }
        catch (Exception ex) when (ex is IOException or InstrumentException or ObjectDisposedException
                                       || (ex is InvalidOperationException && !connection.IsOpen))
        {
            return DeviceSessionEnd.ConnectionFailed;
        }
        finally
        {
            await CloseQuietlyAsync(connection).ConfigureAwait(false);
        }
    }

    private async Task<DeviceSessionEnd> PumpAsync(ITransport connection, CancellationToken cancellationToken)
    {
        var chunk = new byte[ReadChunkBytes];
        // One byte over the limit is kept so that a CR before the LF of a full-length line still fits.
        var line = new byte[_maxLineBytes + 1];
        int length = 0;
        bool discarding = false;
        bool crOrLf = Protocol.LineEnd == CommandLineEnd.CarriageReturnOrLineFeed;
        while (true)
        {
            cancellationToken.ThrowIfCancellationRequested();
            int read = await connection.ReadAsync(chunk, cancellationToken).ConfigureAwait(false);
            if (read == 0)
            {
                return DeviceSessionEnd.PeerClosed;
            }

            for (int i = 0; i < read; i++)
            {
                byte b = chunk[i];
                bool ends = b == (byte)'\n' || (crOrLf && b == (byte)'\r');
                if (!ends)
                {
                    if (discarding)
                    {
                        continue;
                    }

                    if (length == line.Length)
                    {
                        discarding = true;
                        length = 0;
                        continue;
                    }

                    line[length++] = b;
                    continue;
                }

                int used = length;
                if (!crOrLf && used > 0 && line[used - 1] == (byte)'\r')
                {
                    used--;
                }

                byte[] reply;
                if (discarding || used > _maxLineBytes)
                {
                    reply = Handle(p => p.HandleOverlongLine(_maxLineBytes));
                }
                else if (used == 0)
                {
                    reply = [];
                }
                else
                {
                    var text = Encoding.Latin1.GetString(line, 0, used);
                    reply = Handle(p => p.Handle(text));
                }

                discarding = false;
                length = 0;
                if (reply.Length > 0)
                {
                    await connection.WriteAsync(reply, cancellationToken).ConfigureAwait(false);
                }
            }
        }
    }

    private byte[] Handle(Func<IDeviceProtocol, byte[]> handle)
    {
        lock (_gate)
        {
            return handle(Protocol);
        }
    }

    private static async Task CloseQuietlyAsync(ITransport connection)
    {
        try
        {
            await connection.CloseAsync().ConfigureAwait(false);
        }
        catch (Exception ex) when (ex is IOException or InstrumentException or ObjectDisposedException)
        {
            // The link is gone already; there is nothing left to close.
        }
    }
}
