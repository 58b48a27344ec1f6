using System.Globalization;
using System.IO.Ports;
using System.Text;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Transports;

using BenchRunner.Instruments.Capture;

namespace BenchRunner.Instruments.Connections;

/// <summary>
/// Where an instrument is and how to reach it, parsed from one line of text:
/// <c>KIND:TARGET</c>, optionally followed by <c>?name=value&amp;name=value</c>.
/// <list type="bullet">
/// <item><c>serial:/dev/ttyUSB0?baud=115200&amp;parity=none&amp;data=8&amp;stop=1&amp;handshake=none&amp;dtr=on&amp;rts=on</c>
/// (every option optional; the values shown are the defaults).</item>
/// <item><c>tcp:127.0.0.1:5025?connect-timeout=5s</c> (an IPv6 address in brackets: <c>tcp:[::1]:5025</c>).</item>
/// <item><c>replay:sessions/psf-tune.capture?mode=strict&amp;pace=fast</c> (modes strict, lenient; paces fast, recorded).</item>
/// <item><c>sim:NAME</c>, a virtual-bench instrument; its options are passed to the simulator unchecked.</item>
/// </list>
/// Kinds, option names and option words are case-insensitive; a device or file path is taken as written.
/// The full syntax is described in docs/connections.md.
/// </summary>
public sealed class ConnectionSpec
{
    /// <summary>The kind word for a serial port.</summary>
    public const string SerialScheme = "serial";

    /// <summary>The kind word for a TCP connection.</summary>
    public const string TcpScheme = "tcp";

    /// <summary>The kind word for a recorded session.</summary>
    public const string ReplayScheme = "replay";

    /// <summary>The kind word for a virtual-bench instrument.</summary>
    public const string SimulatorScheme = "sim";

    /// <summary>Every kind word the syntax knows.</summary>
    public static readonly IReadOnlyList<string> Schemes = [SerialScheme, TcpScheme, ReplayScheme, SimulatorScheme];

    internal ConnectionSpec(string scheme, string target, IReadOnlyList<KeyValuePair<string, string>> options,
        SerialSettings? serial = null, TcpSettings? tcp = null, ReplaySettings? replay = null)
    {
        Scheme = scheme;
        Target = target;
        Options = options;
        Serial = serial;
        Tcp = tcp;
        Replay = replay;
    }

    /// <summary>The kind of connection: one of <see cref="Schemes"/>, lower-case.</summary>
    public string Scheme { get; }

    /// <summary>What follows the kind, without options: a device path, host:port, a file path or a name.</summary>
    public string Target { get; }

    /// <summary>The options as written, in order, names lower-cased.</summary>
    public IReadOnlyList<KeyValuePair<string, string>> Options { get; }

    /// <summary>The serial settings, for <c>serial:</c> connections; otherwise null.</summary>
    public SerialSettings? Serial { get; }

    /// <summary>The TCP settings, for <c>tcp:</c> connections; otherwise null.</summary>
    public TcpSettings? Tcp { get; }

    /// <summary>The replay settings, for <c>replay:</c> connections; otherwise null.</summary>
    public ReplaySettings? Replay { get; }

    /// <summary>The virtual-bench instrument's name, for <c>sim:</c> connections; otherwise null.</summary>
    public string? SimulatorName => Scheme == SimulatorScheme ? Target : null;

    /// <summary>
    /// Parses a connection. Never throws for bad text: the failure says what was wrong and what
    /// was expected.
    /// </summary>
    public static ParseResult<ConnectionSpec> Parse(string? text) => ConnectionSpecParser.Parse(text);

    /// <summary>
    /// The connection in full, every option spelled out with its value (defaults included for
    /// serial, TCP and replay); parsing it gives an equal connection.
    /// </summary>
    public override string ToString()
    {
        var text = new StringBuilder(Scheme).Append(':');
        var options = new List<(string Name, string Value)>();
        if (Serial is { } serial)
        {
            text.Append(serial.PortPath);
            options.Add(("baud", serial.BaudRate.ToString(CultureInfo.InvariantCulture)));
            options.Add(("parity", serial.Parity.ToString().ToLowerInvariant()));
            options.Add(("data", serial.DataBits.ToString(CultureInfo.InvariantCulture)));
            options.Add(("stop", serial.StopBits == StopBits.Two ? "2" : "1"));
            options.Add(("handshake", ConnectionSpecParser.HandshakeWord(serial.Handshake)));
            options.Add(("dtr", serial.Dtr ? "on" : "off"));
            if (!serial.HandshakeUsesRts)
            {
                options.Add(("rts", serial.Rts ? "on" : "off"));
            }
        }
        else if (Tcp is { } tcp)
        {
            text.Append(tcp.Endpoint);
            options.Add(("connect-timeout", ConnectionSpecParser.DurationText(tcp.ConnectTimeout)));
        }
        else if (Replay is { } replay)
        {
            text.Append(replay.Path);
            options.Add(("mode", replay.Mode.ToString().ToLowerInvariant()));
            options.Add(("pace", replay.Pace.ToString().ToLowerInvariant()));
        }
        else
        {
            text.Append(Target);
            options.AddRange(Options.Select(o => (o.Key, o.Value)));
        }

        for (int i = 0; i < options.Count; i++)
        {
            text.Append(i == 0 ? '?' : '&').Append(options[i].Name).Append('=').Append(options[i].Value);
        }

        return text.ToString();
    }
}
