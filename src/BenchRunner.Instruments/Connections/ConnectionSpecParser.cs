using System.Globalization;
using System.IO.Ports;
using System.Text.RegularExpressions;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Transports;

using BenchRunner.Instruments.Capture;

namespace BenchRunner.Instruments.Connections;

/// <summary>The strict parser behind <see cref="ConnectionSpec.Parse"/>.</summary>
internal static partial class ConnectionSpecParser
{
    private const string Examples = "serial:/dev/ttyUSB0, tcp:127.0.0.1:5025, replay:FILE or sim:NAME";

    private static readonly string[] SerialOptions = ["baud", "parity", "data", "stop", "handshake", "dtr", "rts"];
    private static readonly string[] TcpOptions = ["connect-timeout"];
    private static readonly string[] ReplayOptions = ["mode", "pace"];

    private static readonly (string Word, Handshake Value)[] Handshakes =
        [("none", Handshake.None), ("rts-cts", Handshake.RequestToSend), ("xon-xoff", Handshake.XOnXOff), ("both", Handshake.RequestToSendXOnXOff)];

    [GeneratedRegex("^[a-z][a-z0-9-]*$")]
    private static partial Regex OptionName();

    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_-]*$")]
    private static partial Regex SimulatorName();

    [GeneratedRegex("^COM[1-9][0-9]*$", RegexOptions.IgnoreCase)]
    private static partial Regex WindowsPort();

    [GeneratedRegex("^([0-9]+(?:\\.[0-9]+)?)(ms|s)$")]
    private static partial Regex Duration();

    public static ParseResult<ConnectionSpec> Parse(string? text)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return ParseResult<ConnectionSpec>.Fail($"the connection is empty; expected one such as {Examples}");
        }

        text = text.Trim();
        string? error = TryParse(text, out var spec);
        return error is null ? ParseResult<ConnectionSpec>.Ok(spec!) : ParseResult<ConnectionSpec>.Fail($"connection \"{text}\": {error}");
    }

    public static string HandshakeWord(Handshake handshake) => Handshakes.First(h => h.Value == handshake).Word;

    public static string DurationText(TimeSpan duration) =>
        duration.TotalMilliseconds % 1000 == 0
            ? (duration.TotalMilliseconds / 1000).ToString(CultureInfo.InvariantCulture) + "s"
            : duration.TotalMilliseconds.ToString(CultureInfo.InvariantCulture) + "ms";

    private static string? TryParse(string text, out ConnectionSpec? spec)
    {
        spec = null;
        int colon = text.IndexOf(':');
        if (colon <= 0)
        {
            return $"expected a kind and a target separated by ':', such as {Examples}";
        }

        var scheme = text[..colon].ToLowerInvariant();
        if (!ConnectionSpec.Schemes.Contains(scheme))
        {
            return $"unknown kind \"{text[..colon]}\"; expected serial, tcp, replay or sim";
        }

        var rest = text[(colon + 1)..];
        int question = rest.IndexOf('?');
        var target = question < 0 ? rest : rest[..question];
        if (target.Length == 0)
        {
            return scheme switch
            {
                ConnectionSpec.SerialScheme => "expected a device path after \"serial:\", such as serial:/dev/ttyUSB0",
                ConnectionSpec.TcpScheme => "expected host:port after \"tcp:\", such as tcp:127.0.0.1:5025",
                ConnectionSpec.ReplayScheme => "expected a capture file after \"replay:\", such as replay:sessions/psf-tune.capture",
                _ => "expected an instrument name after \"sim:\", such as sim:vna",
            };
        }

        var options = new List<KeyValuePair<string, string>>();
        if (question >= 0 && ParseOptions(rest[(question + 1)..], options) is { } optionError)
        {
            return optionError;
        }

        return scheme switch
        {
            ConnectionSpec.SerialScheme => ParseSerial(target, options, out spec),
            ConnectionSpec.TcpScheme => ParseTcp(target, options, out spec),
            ConnectionSpec.ReplayScheme => ParseReplay(target, options, out spec),
            _ => ParseSimulator(target, options, out spec),
        };
    }

    private static string? ParseOptions(string query, List<KeyValuePair<string, string>> options)
    {
        if (query.Length == 0)
        {
            return "nothing follows '?'; expected options written name=value and joined by '&'";
        }

        foreach (var item in query.Split('&'))
        {
            if (item.Length == 0)
            {
                return "an empty option (two '&' together, or '&' at an end); expected name=value";
            }

            int equals = item.IndexOf('=');
            if (equals < 0)
            {
                return $"option \"{item}\" has no value; expected name=value";
            }

            var name = item[..equals].ToLowerInvariant();
            var value = item[(equals + 1)..];
            if (!OptionName().IsMatch(name))
            {
                return $"\"{item[..equals]}\" is not an option name; expected a word of letters, digits and '-'";
            }

            if (value.Length == 0)
            {
                return $"option \"{name}\" has no value; expected {name}=value";
            }

            if (value.Any(char.IsWhiteSpace))
            {
                return $"the value of option \"{name}\" contains a space";
            }

            if (options.Any(o => o.Key == name))
            {
                return $"option \"{name}\" is given twice";
            }

            options.Add(new(name, value));
        }

        return null;
    }

    private static string? ParseSerial(string target, List<KeyValuePair<string, string>> options, out ConnectionSpec? spec)
    {
        spec = null;
        if (!(target.StartsWith('/') || WindowsPort().IsMatch(target)) || target.Any(char.IsWhiteSpace))
        {
            return $"\"{target}\" is not a device path; expected an absolute path such as /dev/ttyUSB0 (or COM3 on Windows)";
        }

        if (Unknown(options, SerialOptions, "serial") is { } unknown)
        {
            return unknown;
        }

        var settings = new SerialSettings { PortPath = target };
        foreach (var (name, value) in options)
        {
            string? error = null;
            switch (name)
            {
                case "baud":
                    if (!int.TryParse(value, NumberStyles.None, CultureInfo.InvariantCulture, out int baud) || baud is < SerialSettings.MinBaudRate or > SerialSettings.MaxBaudRate)
                    {
                        error = $"baud must be a whole number of bits per second, {SerialSettings.MinBaudRate} to {SerialSettings.MaxBaudRate}, not \"{value}\"";
                    }
                    else
                    {
                        settings = settings with { BaudRate = baud };
                    }

                    break;
                case "parity":
                    error = Word(value, "parity", [("none", Parity.None), ("even", Parity.Even), ("odd", Parity.Odd), ("mark", Parity.Mark), ("space", Parity.Space)], out var parity);
                    settings = settings with { Parity = parity };
                    break;
                case "data":
                    error = Word(value, "data", [("5", 5), ("6", 6), ("7", 7), ("8", 8)], out var dataBits);
                    settings = settings with { DataBits = dataBits };
                    break;
                case "stop":
                    error = Word(value, "stop", [("1", StopBits.One), ("2", StopBits.Two)], out var stopBits);
                    settings = settings with { StopBits = stopBits };
                    break;
                case "handshake":
                    error = Word(value, "handshake", Handshakes, out var handshake);
                    settings = settings with { Handshake = handshake };
                    break;
                case "dtr":
                    error = Word(value, "dtr", [("on", true), ("off", false)], out var dtr);
                    settings = settings with { Dtr = dtr };
                    break;
                case "rts":
                    error = Word(value, "rts", [("on", true), ("off", false)], out var rts);
                    settings = settings with { Rts = rts };
                    break;
            }

            if (error is not null)
            {
                return error;
            }
        }

        if (settings.HandshakeUsesRts && options.Any(o => o.Key == "rts"))
        {
            return $"rts cannot be set with handshake={HandshakeWord(settings.Handshake)}, which drives the RTS line itself";
        }

        spec = new ConnectionSpec(ConnectionSpec.SerialScheme, target, options, serial: settings);
        return null;
    }

    private static string? ParseTcp(string target, List<KeyValuePair<string, string>> options, out ConnectionSpec? spec)
    {
        spec = null;
        const string expected = "expected host:port, such as tcp:127.0.0.1:5025 or tcp:[::1]:5025";
        string host;
        string portText;
        if (target.StartsWith('['))
        {
            int close = target.IndexOf(']');
            if (close < 0 || close + 1 >= target.Length || target[close + 1] != ':')
            {
                return $"\"{target}\" is not host:port; {expected}";
            }

            host = target[1..close];
            portText = target[(close + 2)..];
            if (Uri.CheckHostName(host) != UriHostNameType.IPv6)
            {
                return $"\"{host}\" in brackets is not an IPv6 address";
            }
        }
        else
        {
            int colon = target.LastIndexOf(':');
            if (colon < 0)
            {
                return $"\"{target}\" has no port; {expected}";
            }

            host = target[..colon];
            portText = target[(colon + 1)..];
            if (host.Contains(':'))
            {
                return $"\"{target}\" is ambiguous; write an IPv6 address in brackets, such as tcp:[::1]:5025";
            }

            if (Uri.CheckHostName(host) is not (UriHostNameType.Dns or UriHostNameType.IPv4))
            {
                return $"\"{host}\" is not a host name or an IPv4 address; {expected}";
            }
        }

        if (!int.TryParse(portText, NumberStyles.None, CultureInfo.InvariantCulture, out int port) || port is < 1 or > 65535)
        {
            return $"the port must be a number from 1 to 65535, not \"{portText}\"";
        }

        if (Unknown(options, TcpOptions, "tcp") is { } unknown)
        {
            return unknown;
        }

        var settings = new TcpSettings { Host = host, Port = port };
        foreach (var (name, value) in options)
        {
            var match = Duration().Match(value);
            var milliseconds = match.Success
                ? double.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture) * (match.Groups[2].Value == "s" ? 1000 : 1)
                : double.NaN;
            if (!(milliseconds >= 1 && milliseconds <= TcpSettings.MaxConnectTimeout.TotalMilliseconds))
            {
                return $"{name} must be a time with its unit, 1ms to 600s, such as 500ms or 5s, not \"{value}\"";
            }

            settings = settings with { ConnectTimeout = TimeSpan.FromMilliseconds(Math.Round(milliseconds)) };
        }

        spec = new ConnectionSpec(ConnectionSpec.TcpScheme, target, options, tcp: settings);
        return null;
    }

    private static string? ParseReplay(string target, List<KeyValuePair<string, string>> options, out ConnectionSpec? spec)
    {
        spec = null;
        if (Unknown(options, ReplayOptions, "replay") is { } unknown)
        {
            return unknown;
        }

        var settings = new ReplaySettings { Path = target };
        foreach (var (name, value) in options)
        {
            string? error;
            if (name == "mode")
            {
                error = Word(value, name, [("strict", ReplayMode.Strict), ("lenient", ReplayMode.Lenient)], out var mode);
                settings = settings with { Mode = mode };
            }
            else
            {
                error = Word(value, name, [("fast", ReplayPace.AsFastAsPossible), ("recorded", ReplayPace.Recorded)], out var pace);
                settings = settings with { Pace = pace };
            }

            if (error is not null)
            {
                return error;
            }
        }

        spec = new ConnectionSpec(ConnectionSpec.ReplayScheme, target, options, replay: settings);
        return null;
    }

    private static string? ParseSimulator(string target, List<KeyValuePair<string, string>> options, out ConnectionSpec? spec)
    {
        spec = null;
        if (!SimulatorName().IsMatch(target))
        {
            return $"\"{target}\" is not an instrument name; expected letters, digits, '-' and '_', starting with a letter, such as sim:vna";
        }

        spec = new ConnectionSpec(ConnectionSpec.SimulatorScheme, target, options);
        return null;
    }

    private static string? Unknown(List<KeyValuePair<string, string>> options, string[] known, string kind)
    {
        var unknown = options.FirstOrDefault(o => !known.Contains(o.Key));
        return unknown.Key is null
            ? null
            : $"unknown {kind} option \"{unknown.Key}\"; expected {Alternatives(known)}";
    }

    private static string? Word<T>(string value, string name, (string Word, T Value)[] choices, out T result)
    {
        foreach (var (word, choice) in choices)
        {
            if (string.Equals(word, value, StringComparison.OrdinalIgnoreCase))
            {
                result = choice;
                return null;
            }
        }

        result = choices[0].Value;
        return $"{name} must be {Alternatives(choices.Select(c => c.Word).ToArray())}, not \"{value}\"";
    }

    private static string Alternatives(string[] words) =>
        words.Length == 1 ? words[0] : string.Join(", ", words[..^1]) + " or " + words[^1];
}
