using System.IO.Ports;

namespace BenchRunner.Instruments.Transports;

/// <summary>
/// How to open a serial port. Defaults: 115200 baud, 8 data bits, no parity, 1 stop bit
/// ("8N1"), no handshake, DTR and RTS asserted (many USB instruments only answer while DTR is
/// on). With an RTS/CTS handshake the driver owns RTS and <see cref="Rts"/> is ignored.
/// </summary>
public sealed record SerialSettings
{
    /// <summary>The default baud rate, 115200.</summary>
    public const int DefaultBaudRate = 115200;

    /// <summary>The lowest baud rate accepted, 50.</summary>
    public const int MinBaudRate = 50;

    /// <summary>The highest baud rate accepted, 4,000,000.</summary>
    public const int MaxBaudRate = 4_000_000;

    /// <summary>The device path, e.g. <c>/dev/ttyUSB0</c> or <c>/dev/ttyACM0</c> (<c>COM3</c> on Windows).</summary>
    public required string PortPath { get; init; }

    /// <summary>Bits per second; default 115200; 50 to 4,000,000.</summary>
    public int BaudRate { get; init; } = DefaultBaudRate;

    /// <summary>Parity; default none.</summary>
    public Parity Parity { get; init; } = Parity.None;

    /// <summary>Data bits per character, 5 to 8; default 8.</summary>
    public int DataBits { get; init; } = 8;

    /// <summary>Stop bits, one or two; default one.</summary>
    public StopBits StopBits { get; init; } = StopBits.One;

    /// <summary>Flow control; default none.</summary>
    public Handshake Handshake { get; init; } = Handshake.None;

    /// <summary>Whether DTR is asserted while the port is open; default true.</summary>
    public bool Dtr { get; init; } = true;

    /// <summary>Whether RTS is asserted while the port is open; default true. Ignored with an RTS/CTS handshake.</summary>
    public bool Rts { get; init; } = true;

    /// <summary>True when the handshake uses the RTS and CTS lines.</summary>
    public bool HandshakeUsesRts => Handshake is Handshake.RequestToSend or Handshake.RequestToSendXOnXOff;

    /// <summary>Every problem with these settings, empty when they are valid.</summary>
    public IReadOnlyList<string> Problems()
    {
        var problems = new List<string>();
        if (string.IsNullOrWhiteSpace(PortPath)) problems.Add("the port path must not be empty");
        if (BaudRate is < MinBaudRate or > MaxBaudRate) problems.Add($"the baud rate must be {MinBaudRate} to {MaxBaudRate}, not {BaudRate}");
        if (DataBits is < 5 or > 8) problems.Add($"data bits must be 5 to 8, not {DataBits}");
        if (StopBits is not (StopBits.One or StopBits.Two)) problems.Add($"stop bits must be 1 or 2, not {StopBits}");
        if (!Enum.IsDefined(Parity)) problems.Add($"unknown parity {Parity}");
        if (!Enum.IsDefined(Handshake)) problems.Add($"unknown handshake {Handshake}");
        return problems;
    }

    /// <summary>Throws <see cref="ArgumentException"/> naming every invalid setting.</summary>
    public void Validate()
    {
        var problems = Problems();
        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid serial settings: " + string.Join("; ", problems) + ".");
        }
    }

    /// <summary>A short form for messages, e.g. <c>/dev/ttyUSB0 115200 8N1</c>.</summary>
    public override string ToString()
    {
        char parity = Parity switch
        {
            Parity.Even => 'E',
            Parity.Odd => 'O',
            Parity.Mark => 'M',
            Parity.Space => 'S',
            _ => 'N',
        };
        int stop = StopBits == StopBits.Two ? 2 : 1;
        return $"{PortPath} {BaudRate} {DataBits}{parity}{stop}";
    }
}
