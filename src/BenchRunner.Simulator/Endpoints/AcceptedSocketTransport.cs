using System.Net.Sockets;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Simulator.Endpoints;

/// <summary>The device end of one accepted TCP connection.</summary>
internal sealed class AcceptedSocketTransport(Socket socket) : ITransport
{
    private readonly NetworkStream _stream = new(socket, ownsSocket: true);

    public string Description { get; } = $"tcp peer {socket.RemoteEndPoint}";

    public bool IsOpen { get; private set; } = true;

    public ValueTask OpenAsync(CancellationToken cancellationToken) => ValueTask.CompletedTask;

    public ValueTask WriteAsync(ReadOnlyMemory<byte> data, CancellationToken cancellationToken) =>
        _stream.WriteAsync(data, cancellationToken);

    public async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken)
    {
        try
        {
            return await _stream.ReadAsync(buffer, cancellationToken).ConfigureAwait(false);
        }
        catch (IOException)
        {
            // A peer that resets the connection has simply gone.
            return 0;
        }
    }

    public async ValueTask CloseAsync()
    {
        IsOpen = false;
        await _stream.DisposeAsync().ConfigureAwait(false);
    }

    public ValueTask DisposeAsync() => CloseAsync();
}
