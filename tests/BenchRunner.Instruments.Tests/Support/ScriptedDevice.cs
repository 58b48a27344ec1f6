using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>
/// A device end that reads LF-terminated commands and answers each with the pieces a script
/// returns (each piece written separately, so replies can arrive in several chunks; no pieces
/// for a command that has no reply). Runs until the host closes its end.
/// </summary>
public static class ScriptedDevice
{
    public static Task RunAsync(ITransport device, Func<string, IReadOnlyList<byte[]>> script) => Task.Run(async () =>
    {
        await device.OpenAsync(CancellationToken.None);
        var framed = new FramedConnection(device);
        while (true)
        {
            string command;
            try
            {
                command = await framed.ReadLineAsync(TimeSpan.FromSeconds(10), CancellationToken.None);
            }
            catch (FramingException)
            {
                break;
            }

            foreach (var piece in script(command))
            {
                await device.WriteAsync(piece, CancellationToken.None);
            }
        }

        await device.CloseAsync();
    });
}
