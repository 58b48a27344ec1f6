using System.Text;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Simulator.Protocols.Scpi;

namespace BenchRunner.Simulator.Tests.Support;

/// <summary>Talks to a <see cref="ScpiServer"/> directly, one program message at a time.</summary>
internal static class ScpiTalk
{
    /// <summary>The response message to <paramref name="message"/>, without its LF; empty when there was none.</summary>
    public static string Ask(this ScpiServer server, string message)
    {
        var bytes = server.Handle(message);
        if (bytes.Length == 0)
        {
            return "";
        }

        Assert.Equal((byte)'\n', bytes[^1]);
        return Encoding.Latin1.GetString(bytes, 0, bytes.Length - 1);
    }

    /// <summary>Sends a message that must have no response.</summary>
    public static void Send(this ScpiServer server, string message) => Assert.Equal("", server.Ask(message));

    /// <summary>The next error-queue entry, read with <c>SYSTem:ERRor?</c> and parsed by the client's parser.</summary>
    public static ScpiError NextError(this ScpiServer server)
    {
        var entry = ScpiError.Parse(server.Ask("SYSTem:ERRor?"));
        Assert.True(entry.Success, entry.Error);
        return entry.Value;
    }

    /// <summary>Every entry up to "no error", codes only.</summary>
    public static List<int> DrainCodes(this ScpiServer server)
    {
        var codes = new List<int>();
        for (var e = server.NextError(); !e.IsNoError; e = server.NextError())
        {
            codes.Add(e.Code);
        }

        return codes;
    }
}
