using System.Text;
using BenchRunner.Simulator.Protocols.Hosting;
using BenchRunner.Simulator.Protocols.Raw;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Raw;

// The bench signal generator's dialect as docs/simulator-dialect.md specifies it (commands end with
// CR, no prompt, no echo, "ok" for every accepted setting).
public class BenchGenServerTests
{
    private readonly FakeSignalGenerator _generator = new();
    private readonly BenchGenServer _server;

    public BenchGenServerTests() => _server = new BenchGenServer(_generator);

    [Fact]
    public void Exchange_AsInTheDocument()
    {
        Assert.Equal("ok\r\n", Say("tone 137.5"));
        Assert.Equal("err 3 value out of range\r\n", Say("lvl -90"));
        Assert.Equal(137.5e6, _generator.Frequency.Hertz);
        Assert.Equal(-80, _generator.Level.Dbm);
    }

    [Fact]
    public void Settings_AreAcknowledged_AndReachTheGenerator()
    {
        Assert.Equal("benchrunner/sim-gen sn SIM-GEN-0001 fw 1.0\r\n", Say("who"));
        Assert.Equal("ok\r\n", Say("tone 1500"));
        Assert.Equal("ok\r\n", Say("tone 0.1"));
        Assert.Equal("ok\r\n", Say("tone 137.123456"));
        Assert.Equal("ok\r\n", Say("lvl -20.125"));
        Assert.Equal("ok\r\n", Say("rf on"));

        Assert.Equal(137_123_456, _generator.Frequency.Hertz, 1e-6);
        Assert.Equal(-20.125, _generator.Level.Dbm);
        Assert.True(_generator.OutputOn);
        Assert.Equal("ok\r\n", Say("rf off"));
        Assert.False(_generator.OutputOn);
    }

    [Theory]
    [InlineData("tone 137.1234567", "err 3 value out of range")]  // up to 6 decimals (1 Hz)
    [InlineData("tone 0.0999999", "err 3 value out of range")]    // 0.1 to 1500 MHz
    [InlineData("tone 1500.000001", "err 3 value out of range")]
    [InlineData("tone 1e30", "err 3 value out of range")]
    [InlineData("lvl -20.1234", "err 3 value out of range")]      // up to 3 decimals
    [InlineData("lvl 0.001", "err 3 value out of range")]         // -80 to 0 dBm
    [InlineData("rf maybe", "err 3 value out of range")]
    [InlineData("rf ON", "err 3 value out of range")]
    [InlineData("tone", "err 2 wrong number of arguments")]
    [InlineData("rf", "err 2 wrong number of arguments")]
    [InlineData("tone 137.5MHz", "err 4 not a number")]
    [InlineData("lvl -20,5", "err 4 not a number")]
    [InlineData("freq 137.5", "err 1 unknown command")]
    public void RefusedCommand_IsAnsweredByItsErrorLine_AndChangesNothing(string command, string error)
    {
        var before = (_generator.Frequency, _generator.Level, _generator.OutputOn);

        Assert.Equal($"{error}\r\n", Say(command));

        Assert.Equal(before, (_generator.Frequency, _generator.Level, _generator.OutputOn));
    }

    [Fact]
    public async Task Served_CommandsEndedByCrOrCrLf_AreEachAnsweredOnce()
    {
        await using var served = ServedDevice.Start(_server);

        await served.SendAsync("tone 137.5\r");
        Assert.Equal("ok\r\n", await served.ReadUntilAsync("\r\n"));
        await served.SendAsync("lvl -20\r\nrf on\r");
        Assert.Equal("ok\r\nok\r\n", await served.ReadUntilAsync("ok\r\nok\r\n"));

        Assert.Equal(CommandLineEnd.CarriageReturnOrLineFeed, _server.LineEnd);
        Assert.True(_generator.OutputOn);
    }

    private string Say(string line) => Encoding.Latin1.GetString(_server.Handle(line));
}
