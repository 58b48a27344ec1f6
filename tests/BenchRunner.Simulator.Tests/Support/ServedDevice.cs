using System.Text;
using BenchRunner.Instruments.Transports;
using BenchRunner.Simulator.Protocols.Hosting;

namespace BenchRunner.Simulator.Tests.Support;

/// <summary>A protocol served by a <see cref="SimulatedDeviceHost"/> on the device end of an in-memory pair; the test talks on <see cref="Host"/>.</summary>
internal sealed class ServedDevice : IAsyncDisposable
{
    private readonly CancellationTokenSource _stop = new();
    private readonly StringBuilder _received = new();

    private ServedDevice(IDeviceProtocol protocol, SimulatedDeviceHostOptions? options)
    {
        var (host, device) = InMemoryTransport.CreatePair("served");
        Host = host;
        DeviceEnd = device;
        DeviceHost = new SimulatedDeviceHost(protocol, options);
        Serving = DeviceHost.ServeAsync(device, _stop.Token);
    }

    public InMemoryTransport Host { get; }

    public InMemoryTransport DeviceEnd { get; }

    public SimulatedDeviceHost DeviceHost { get; }

    public Task<DeviceSessionEnd> Serving { get; }

    public static ServedDevice Start(IDeviceProtocol protocol, SimulatedDeviceHostOptions? options = null) => new(protocol, options);

    /// <summary>Opens the host end (if needed) and writes <paramref name="text"/> as Latin-1 bytes.</summary>
    public async Task SendAsync(string text)
    {
        await Host.OpenAsync(CancellationToken.None);
        await Host.WriteAsync(Encoding.Latin1.GetBytes(text), CancellationToken.None).AsTask().WaitAsync(TestLimits.Await);
    }

    /// <summary>Reads until what came since the last call ends with <paramref name="end"/>, and returns it.</summary>
    public async Task<string> ReadUntilAsync(string end)
    {
        await Host.OpenAsync(CancellationToken.None);
        var buffer = new byte[4096];
        using var timeout = new CancellationTokenSource(TestLimits.Await);
        while (!_received.ToString().EndsWith(end, StringComparison.Ordinal))
        {
            int n = await Host.ReadAsync(buffer, timeout.Token);
            if (n == 0)
            {
                throw new InvalidOperationException($"The device closed the connection; received \"{_received}\".");
            }

            _received.Append(Encoding.Latin1.GetString(buffer, 0, n));
        }

        var text = _received.ToString();
        _received.Clear();
        return text;
    }

    public async ValueTask DisposeAsync()
    {
        await _stop.CancelAsync();
        try
        {
            await Serving.WaitAsync(TestLimits.Await);
        }
        finally
        {
            await Host.CloseAsync();
            _stop.Dispose();
        }
    }
}
