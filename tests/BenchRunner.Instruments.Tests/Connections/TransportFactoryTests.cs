using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Connections;

public class TransportFactoryTests
{
    private static ConnectionSpec Spec(string text) => ConnectionSpec.Parse(text).GetValueOrThrow();

    [Fact]
    public async Task Create_SerialConnection_GivesUnopenedSerialTransportWithItsSettings()
    {
        await using var transport = new TransportFactory().Create(Spec("serial:/dev/ttyUSB0?baud=9600"));

        var serial = Assert.IsType<SerialTransport>(transport);
        Assert.Equal(9600, serial.Settings.BaudRate);
        Assert.False(serial.IsOpen);
    }

    [Fact]
    public async Task Create_TcpConnection_GivesTcpTransport()
    {
        await using var transport = new TransportFactory().Create(Spec("tcp:127.0.0.1:5025"));

        var tcp = Assert.IsType<TcpTransport>(transport);
        Assert.Equal("127.0.0.1:5025", tcp.Settings.Endpoint);
    }

    [Fact]
    public void Create_KindNotRegistered_ThrowsPermanentErrorNamingTheKind()
    {
        var spec = Spec("sim:vna");

        var error = Assert.Throws<InstrumentException>(() => new TransportFactory().Create(spec));

        Assert.False(error.IsTransient);
        Assert.Contains($"{spec.Scheme} connections are not available", error.Message);
    }

    [Fact]
    public void Create_ReplayOfAMissingCapture_IsBadInputNamingTheFile()
    {
        var error = Assert.Throws<BenchRunner.Core.Diagnostics.InputFormatException>(
            () => new TransportFactory().Create(Spec("replay:no-such-lot7.capture?mode=lenient")));

        Assert.Equal("no-such-lot7.capture: no such file", error.Message);
    }

    [Fact]
    public async Task Create_RegisteredSimulator_CallsItsCreatorWithTheParsedConnection()
    {
        ConnectionSpec? seen = null;
        var factory = new TransportFactory().Register("sim", spec =>
        {
            seen = spec;
            return InMemoryTransport.CreatePair(spec.SimulatorName!).Host;
        });

        await using var transport = factory.Create(Spec("sim:sa?seed=4"));

        Assert.Equal("sa (host end)", transport.Description);
        Assert.Equal("sa", seen!.SimulatorName);
        Assert.Contains("sim", factory.RegisteredSchemes);
    }

    [Fact]
    public void Register_KindTheSyntaxDoesNotKnow_ThrowsArgumentException()
    {
        Assert.Throws<ArgumentException>(() => new TransportFactory().Register("usb", _ => throw new InvalidOperationException()));
    }
}
