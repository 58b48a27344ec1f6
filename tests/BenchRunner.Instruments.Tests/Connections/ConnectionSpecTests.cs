using System.IO.Ports;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Transports;

using BenchRunner.Instruments.Capture;

namespace BenchRunner.Instruments.Tests.Connections;

public class ConnectionSpecTests
{
    [Fact]
    public void Parse_BareSerialPath_UsesDocumentedDefaults()
    {
        var spec = ConnectionSpec.Parse("serial:/dev/ttyUSB0").GetValueOrThrow();

        var serial = Assert.IsType<SerialSettings>(spec.Serial);
        Assert.Equal("serial", spec.Scheme);
        Assert.Equal("/dev/ttyUSB0", serial.PortPath);
        Assert.Equal(115200, serial.BaudRate);
        Assert.Equal(Parity.None, serial.Parity);
        Assert.Equal(8, serial.DataBits);
        Assert.Equal(StopBits.One, serial.StopBits);
        Assert.Equal(Handshake.None, serial.Handshake);
        Assert.True(serial.Dtr);
        Assert.True(serial.Rts);
        Assert.Null(spec.Tcp);
    }

    [Fact]
    public void Parse_SerialWithEveryOption_SetsEachOne()
    {
        var spec = ConnectionSpec.Parse("serial:/dev/ttyACM1?baud=9600&parity=even&data=7&stop=2&handshake=xon-xoff&dtr=off&rts=off").GetValueOrThrow();

        Assert.Equal(new SerialSettings
        {
            PortPath = "/dev/ttyACM1",
            BaudRate = 9600,
            Parity = Parity.Even,
            DataBits = 7,
            StopBits = StopBits.Two,
            Handshake = Handshake.XOnXOff,
            Dtr = false,
            Rts = false,
        }, spec.Serial);
    }

    [Fact]
    public void Parse_KindAndOptionNamesInCapitals_AreAccepted()
    {
        var spec = ConnectionSpec.Parse("  SERIAL:/dev/ttyUSB0?Baud=57600&PARITY=Odd  ").GetValueOrThrow();

        Assert.Equal(57600, spec.Serial!.BaudRate);
        Assert.Equal(Parity.Odd, spec.Serial.Parity);
    }

    [Theory]
    [InlineData("rts-cts", Handshake.RequestToSend)]
    [InlineData("both", Handshake.RequestToSendXOnXOff)]
    public void Parse_HandshakeUsingRts_LeavesRtsToTheDriver(string word, Handshake expected)
    {
        var spec = ConnectionSpec.Parse($"serial:/dev/ttyUSB0?handshake={word}").GetValueOrThrow();

        Assert.Equal(expected, spec.Serial!.Handshake);
        Assert.True(spec.Serial.HandshakeUsesRts);
        Assert.DoesNotContain("rts=", spec.ToString());
    }

    [Fact]
    public void Parse_WindowsPortName_IsAccepted()
    {
        Assert.Equal("COM3", ConnectionSpec.Parse("serial:COM3").GetValueOrThrow().Serial!.PortPath);
    }

    [Fact]
    public void Parse_TcpAddress_DefaultsToFiveSecondConnectTimeout()
    {
        var tcp = ConnectionSpec.Parse("tcp:127.0.0.1:5025").GetValueOrThrow().Tcp!;

        Assert.Equal("127.0.0.1", tcp.Host);
        Assert.Equal(5025, tcp.Port);
        Assert.Equal(TimeSpan.FromSeconds(5), tcp.ConnectTimeout);
    }

    [Theory]
    [InlineData("tcp:[::1]:5025", "::1", 5025)]
    [InlineData("tcp:vna.bench.lan:5025?connect-timeout=500ms", "vna.bench.lan", 5025)]
    [InlineData("tcp:10.0.0.7:1?connect-timeout=2.5s", "10.0.0.7", 1)]
    public void Parse_TcpForms_GiveHostAndPort(string text, string host, int port)
    {
        var tcp = ConnectionSpec.Parse(text).GetValueOrThrow().Tcp!;

        Assert.Equal(host, tcp.Host);
        Assert.Equal(port, tcp.Port);
    }

    [Theory]
    [InlineData("500ms", 500)]
    [InlineData("2.5s", 2500)]
    [InlineData("600s", 600_000)]
    public void Parse_ConnectTimeout_TakesItsUnit(string value, int milliseconds)
    {
        var tcp = ConnectionSpec.Parse($"tcp:127.0.0.1:5025?connect-timeout={value}").GetValueOrThrow().Tcp!;

        Assert.Equal(TimeSpan.FromMilliseconds(milliseconds), tcp.ConnectTimeout);
    }

    [Fact]
    public void Parse_Replay_DefaultsToStrictAndFast()
    {
        var replay = ConnectionSpec.Parse("replay:sessions/psf-24-0001 tune.capture").GetValueOrThrow().Replay!;

        Assert.Equal("sessions/psf-24-0001 tune.capture", replay.Path);
        Assert.Equal(ReplayMode.Strict, replay.Mode);
        Assert.Equal(ReplayPace.AsFastAsPossible, replay.Pace);
    }

    [Fact]
    public void Parse_ReplayWithOptions_SetsModeAndPace()
    {
        var replay = ConnectionSpec.Parse("replay:lot7.capture?mode=lenient&pace=recorded").GetValueOrThrow().Replay!;

        Assert.Equal(ReplayMode.Lenient, replay.Mode);
        Assert.Equal(ReplayPace.Recorded, replay.Pace);
    }

    [Fact]
    public void Parse_Simulator_KeepsNameAndOptionsForTheSimulator()
    {
        var spec = ConnectionSpec.Parse("sim:vna?seed=7&board=PSF-24-0001").GetValueOrThrow();

        Assert.Equal("vna", spec.SimulatorName);
        Assert.Equal([new("seed", "7"), new("board", "PSF-24-0001")], spec.Options);
    }

    [Theory]
    [InlineData("serial:/dev/ttyUSB0")]
    [InlineData("serial:/dev/ttyUSB0?baud=9600&parity=mark&data=5&stop=2&handshake=both&dtr=off")]
    [InlineData("tcp:[::1]:5025?connect-timeout=250ms")]
    [InlineData("replay:a.capture?pace=recorded")]
    [InlineData("sim:sa?seed=3")]
    public void ToString_AnyConnection_ParsesBackToTheSameSettings(string text)
    {
        var spec = ConnectionSpec.Parse(text).GetValueOrThrow();

        var again = ConnectionSpec.Parse(spec.ToString()).GetValueOrThrow();

        Assert.Equal(spec.ToString(), again.ToString());
        Assert.Equal(spec.Serial, again.Serial);
        Assert.Equal(spec.Tcp, again.Tcp);
        Assert.Equal(spec.Replay, again.Replay);
        Assert.Equal(spec.Target, again.Target);
    }

    [Fact]
    public void ToString_BareSerial_SpellsOutEveryDefault()
    {
        var text = ConnectionSpec.Parse("serial:/dev/ttyUSB0").GetValueOrThrow().ToString();

        Assert.Equal("serial:/dev/ttyUSB0?baud=115200&parity=none&data=8&stop=1&handshake=none&dtr=on&rts=on", text);
    }

    [Theory]
    [InlineData("", "the connection is empty")]
    [InlineData("   ", "the connection is empty")]
    [InlineData("/dev/ttyUSB0", "expected a kind and a target separated by ':'")]
    [InlineData("usb:/dev/ttyUSB0", "unknown kind \"usb\"; expected serial, tcp, replay or sim")]
    [InlineData("serial:", "expected a device path after \"serial:\"")]
    [InlineData("serial:ttyUSB0", "\"ttyUSB0\" is not a device path")]
    [InlineData("serial:/dev/tty USB0", "is not a device path")]
    [InlineData("serial:/dev/ttyUSB0?", "nothing follows '?'")]
    [InlineData("serial:/dev/ttyUSB0?baud", "option \"baud\" has no value")]
    [InlineData("serial:/dev/ttyUSB0?baud=", "option \"baud\" has no value")]
    [InlineData("serial:/dev/ttyUSB0?=9600", "is not an option name")]
    [InlineData("serial:/dev/ttyUSB0?baud=9600&&parity=odd", "an empty option")]
    [InlineData("serial:/dev/ttyUSB0?baud=9600&", "an empty option")]
    [InlineData("serial:/dev/ttyUSB0?baud=9600&baud=19200", "option \"baud\" is given twice")]
    [InlineData("serial:/dev/ttyUSB0?speed=9600", "unknown serial option \"speed\"; expected baud, parity, data, stop, handshake, dtr or rts")]
    [InlineData("serial:/dev/ttyUSB0?baud=fast", "baud must be a whole number of bits per second, 50 to 4000000, not \"fast\"")]
    [InlineData("serial:/dev/ttyUSB0?baud=10", "not \"10\"")]
    [InlineData("serial:/dev/ttyUSB0?baud=-9600", "not \"-9600\"")]
    [InlineData("serial:/dev/ttyUSB0?parity=sometimes", "parity must be none, even, odd, mark or space")]
    [InlineData("serial:/dev/ttyUSB0?data=9", "data must be 5, 6, 7 or 8, not \"9\"")]
    [InlineData("serial:/dev/ttyUSB0?stop=1.5", "stop must be 1 or 2, not \"1.5\"")]
    [InlineData("serial:/dev/ttyUSB0?handshake=rtscts", "handshake must be none, rts-cts, xon-xoff or both")]
    [InlineData("serial:/dev/ttyUSB0?dtr=yes", "dtr must be on or off")]
    [InlineData("serial:/dev/ttyUSB0?handshake=rts-cts&rts=off", "rts cannot be set with handshake=rts-cts")]
    [InlineData("tcp:", "expected host:port after \"tcp:\"")]
    [InlineData("tcp:127.0.0.1", "has no port")]
    [InlineData("tcp:127.0.0.1:", "the port must be a number from 1 to 65535, not \"\"")]
    [InlineData("tcp:127.0.0.1:0", "not \"0\"")]
    [InlineData("tcp:127.0.0.1:70000", "not \"70000\"")]
    [InlineData("tcp:127.0.0.1:50x", "not \"50x\"")]
    [InlineData("tcp:::1:5025", "write an IPv6 address in brackets")]
    [InlineData("tcp:[::1]5025", "is not host:port")]
    [InlineData("tcp:[127.0.0.1]:5025", "is not an IPv6 address")]
    [InlineData("tcp:bench host:5025", "\"bench host\" is not a host name or an IPv4 address")]
    [InlineData("tcp:127.0.0.1:5025?connect-timeout=5", "connect-timeout must be a time with its unit")]
    [InlineData("tcp:127.0.0.1:5025?connect-timeout=0ms", "connect-timeout must be a time with its unit")]
    [InlineData("tcp:127.0.0.1:5025?connect-timeout=11min", "connect-timeout must be a time with its unit")]
    [InlineData("tcp:127.0.0.1:5025?timeout=5s", "unknown tcp option \"timeout\"; expected connect-timeout")]
    [InlineData("replay:", "expected a capture file after \"replay:\"")]
    [InlineData("replay:a.capture?mode=loose", "mode must be strict or lenient, not \"loose\"")]
    [InlineData("replay:a.capture?pace=slow", "pace must be fast or recorded, not \"slow\"")]
    [InlineData("replay:a.capture?seed=1", "unknown replay option \"seed\"; expected mode or pace")]
    [InlineData("sim:", "expected an instrument name after \"sim:\"")]
    [InlineData("sim:9vna", "\"9vna\" is not an instrument name")]
    [InlineData("sim:vna?seed", "option \"seed\" has no value")]
    public void Parse_BadText_FailsWithMessageSayingWhatWasExpected(string text, string expected)
    {
        var result = ConnectionSpec.Parse(text);

        Assert.False(result.Success);
        Assert.Contains(expected, result.Error);
    }

    [Fact]
    public void Parse_BadText_MessageQuotesTheConnection()
    {
        var result = ConnectionSpec.Parse("serial:/dev/ttyUSB0?baud=fast");

        Assert.StartsWith("connection \"serial:/dev/ttyUSB0?baud=fast\": ", result.Error);
    }

    [Fact]
    public void Parse_Null_Fails()
    {
        Assert.False(ConnectionSpec.Parse(null).Success);
    }
}
