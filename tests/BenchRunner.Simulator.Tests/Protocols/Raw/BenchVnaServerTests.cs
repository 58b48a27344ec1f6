using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using BenchRunner.Simulator.Protocols.Raw;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Raw;

// The bench network analyser's dialect as docs/simulator-dialect.md specifies it (echo, CR LF, prompt
// "br-vna> ", commands, ranges, error lines); the expected exchanges are the document's own.
public class BenchVnaServerTests
{
    private readonly FakeNetworkAnalyser _vna = new();
    private readonly BenchVnaServer _server;

    public BenchVnaServerTests() => _server = new BenchVnaServer(_vna);

    [Fact]
    public void Who_EchoesThenAnswersTheIdentityThenPrompts()
    {
        Assert.Equal("who\r\nbenchrunner/sim-vna sn SIM-VNA-0001 fw 1.0\r\nbr-vna> ", Say("who"));
    }

    [Fact]
    public void Band_AsInTheDocument_IsEchoedWithAnEmptyReply()
    {
        Assert.Equal("band 127500000 147500000 201\r\nbr-vna> ", Say("band 127500000 147500000 201"));
        Assert.Equal((127.5e6, 147.5e6, 201), (_vna.Start.Hertz, _vna.Stop.Hertz, _vna.Points));
    }

    [Fact]
    public void Data_AfterBandAndGo_IsAHeaderThenOneLinePerPoint()
    {
        Say("band 127500000 147500000 3");
        Assert.Equal("go\r\nbr-vna> ", Say("go"));

        var lines = Say("data s21").Split("\r\n");

        Assert.Equal(["data s21", "# s21 3"], lines[..2]);
        Assert.Equal("br-vna> ", lines[^1]);
        var points = lines[2..^1];
        Assert.Equal(3, points.Length);
        long[] hertz = [127_500_000, 137_500_000, 147_500_000];
        for (int i = 0; i < 3; i++)
        {
            // "<frequency> <re> <im>": whole hertz, then seven significant digits in scientific notation.
            Assert.Matches(new Regex(@"^\d+ -?\d\.\d{6}E[+-]\d{2} -?\d\.\d{6}E[+-]\d{2}$"), points[i]);
            var fields = points[i].Split(' ');
            Assert.Equal(hertz[i], long.Parse(fields[0], CultureInfo.InvariantCulture));
            var expected = FakeNetworkAnalyser.S21(hertz[i]);
            Assert.Equal(expected.Real, double.Parse(fields[1], CultureInfo.InvariantCulture), 1e-6);
            Assert.Equal(expected.Imaginary, double.Parse(fields[2], CultureInfo.InvariantCulture), 1e-6);
        }

        // At resonance S21 = 1 (series impedance two-port, Pozar, Microwave Engineering, Table 4.2).
        Assert.Equal("137500000 1.000000E+00 0.000000E+00", points[1]);
    }

    [Fact]
    public void Data_S11_IsOneMinusS21ForTheSeriesResonator()
    {
        Say("band 136000000 139000000 2");
        Say("go");

        var first = Say("data s11").Split("\r\n")[2].Split(' ');

        var expected = 1 - FakeNetworkAnalyser.S21(136e6);
        Assert.Equal(expected.Real, double.Parse(first[1], CultureInfo.InvariantCulture), 1e-6);
    }

    [Fact]
    public void Go_WithoutABand_IsNoSweep_AndDataBeforeGoToo()
    {
        Assert.Equal("go\r\nerr 5 no sweep\r\nbr-vna> ", Say("go"));
        Say("band 136000000 139000000 11");
        Assert.Equal("data s21\r\nerr 5 no sweep\r\nbr-vna> ", Say("data s21"));
    }

    [Fact]
    public void Band_ForgetsThePreviousSweep_ButIfbwAndAvgDoNot()
    {
        Say("band 136000000 139000000 11");
        Say("go");
        Say("ifbw 1000");
        Say("avg 4");
        Assert.StartsWith("data s21\r\n# s21 11\r\n", Say("data s21"));
        Say("band 136000000 139000000 11");

        Assert.Equal("data s21\r\nerr 5 no sweep\r\nbr-vna> ", Say("data s21"));
        Assert.Equal((1e3, 4), (_vna.IfBandwidth.Hertz, _vna.Averages));
    }

    [Theory]
    [InlineData("WHO", "err 1 unknown command")]                          // commands are lower-case words
    [InlineData("sweep", "err 1 unknown command")]
    [InlineData("band 136000000 139000000", "err 2 wrong number of arguments")]
    [InlineData("band 136000000 139000000 201 4", "err 2 wrong number of arguments")]
    [InlineData("who me", "err 2 wrong number of arguments")]
    [InlineData("go now", "err 2 wrong number of arguments")]
    [InlineData("data", "err 2 wrong number of arguments")]
    [InlineData("band 136MHz 139000000 201", "err 4 not a number")]
    [InlineData("band 136000000 139000000 lots", "err 4 not a number")]
    [InlineData("ifbw 1,000", "err 4 not a number")]
    [InlineData("band 99999 139000000 201", "err 3 value out of range")]    // 100 kHz ≤ start
    [InlineData("band 136000000 1500000001 201", "err 3 value out of range")] // stop ≤ 1.5 GHz
    [InlineData("band 139000000 136000000 201", "err 3 value out of range")] // start < stop
    [InlineData("band 136000000 136000000 201", "err 3 value out of range")]
    [InlineData("band 136000000.5 139000000 201", "err 3 value out of range")] // whole hertz
    [InlineData("band 136000000 139000000 1", "err 3 value out of range")]   // 2 ≤ points ≤ 1601
    [InlineData("band 136000000 139000000 1602", "err 3 value out of range")]
    [InlineData("band 136000000 139000000 20.5", "err 3 value out of range")]
    [InlineData("band 1e40 139000000 201", "err 3 value out of range")]
    [InlineData("ifbw 9", "err 3 value out of range")]                        // 10 Hz to 100 kHz
    [InlineData("ifbw 100001", "err 3 value out of range")]
    [InlineData("avg 0", "err 3 value out of range")]                         // 1 to 100
    [InlineData("avg 101", "err 3 value out of range")]
    [InlineData("data s12", "err 3 value out of range")]                      // only s11 and s21
    public void RefusedCommand_IsEchoed_AnsweredByItsErrorLine_AndChangesNothing(string command, string error)
    {
        Say("band 127500000 147500000 201");
        var before = (_vna.Start, _vna.Stop, _vna.Points, _vna.IfBandwidth, _vna.Averages);

        Assert.Equal($"{command}\r\n{error}\r\nbr-vna> ", Say(command));

        Assert.Equal(before, (_vna.Start, _vna.Stop, _vna.Points, _vna.IfBandwidth, _vna.Averages));
    }

    [Theory]
    [InlineData("band 100000 1500000000 1601")]
    [InlineData("band 1e5 1.5e9 2")]
    [InlineData("band  136000000   139000000 201")]
    [InlineData("ifbw 10")]
    [InlineData("ifbw 100000")]
    [InlineData("avg 100")]
    public void AcceptedCommand_AtTheEdgesOfTheRanges_HasAnEmptyReply(string command)
    {
        Assert.Equal($"{command}\r\nbr-vna> ", Say(command));
    }

    [Fact]
    public void Handle_BlankLine_IsIgnored()
    {
        Assert.Empty(_server.Handle("   "));
    }

    [Fact]
    public void Handle_OverlongLine_IsUnknownCommandWithoutEcho()
    {
        Assert.Equal("err 1 unknown command\r\nbr-vna> ", Encoding.Latin1.GetString(_server.HandleOverlongLine(4096)));
    }

    private string Say(string line) => Encoding.Latin1.GetString(_server.Handle(line));
}
