using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>Opened in-memory pairs, with a framing layer on the host end.</summary>
internal static class Connected
{
    public static async Task<(FramedConnection Host, InMemoryTransport Device)> PairAsync(FramingOptions? options = null)
    {
        var (host, device) = InMemoryTransport.CreatePair();
        await host.OpenAsync(CancellationToken.None);
        await device.OpenAsync(CancellationToken.None);
        return (new FramedConnection(host, options), device);
    }

    public static ValueTask SendAsync(this ITransport device, string text) =>
        device.WriteAsync(System.Text.Encoding.Latin1.GetBytes(text), CancellationToken.None);
}
