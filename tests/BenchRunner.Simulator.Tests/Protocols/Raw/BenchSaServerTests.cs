using System.Text;
using BenchRunner.Simulator.Protocols.Raw;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Raw;

// The bench spectrum analyser's dialect as docs/simulator-dialect.md specifies it (no echo, CR LF,
// prompt "br-sa> ", the trace in hundredths of a dBm on one line).
public class BenchSaServerTests
{
    private readonly FakeSpectrumAnalyser _sa = new();
    private readonly BenchSaServer _server;

    public BenchSaServerTests() => _server = new BenchSaServer(_sa);

    [Fact]
    public void Who_AnswersTheIdentityThenPrompts_WithoutEcho()
    {
        Assert.Equal("benchrunner/sim-sa sn SIM-SA-0001 fw 1.0\r\nbr-sa> ", Say("who"));
    }

    [Fact]
    public void Trace_IsHundredthsOfADbmSeparatedByCommas()
    {
        Assert.Equal("br-sa> ", Say("span 137400000 137600000"));
        Say("rbw 80000");
        Say("pts 11");
        Say("go");

        var reply = Say("trace");

        Assert.EndsWith("\r\nbr-sa> ", reply);
        var fields = reply[..^"\r\nbr-sa> ".Length].Split(',');
        Assert.Equal(11, fields.Length);
        // -30 dBm is -3000 hundredths; two 20 kHz steps (half the RBW) away the fake is 3.0103 dB down: -3301.
        Assert.Equal("-3000", fields[5]);
        Assert.Equal("-3301", fields[7]);
        Assert.Equal("-3301", fields[3]);
        Assert.All(fields, f => Assert.Matches("^-?[0-9]+$", f));
    }

    [Fact]
    public void Trace_AtPowerOnAfterGo_Has401Points()
    {
        Say("go");

        Assert.Equal(401, Say("trace").Split(',').Length);
    }

    [Fact]
    public void Trace_BeforeGoOrAfterAnySetting_IsNoSweep()
    {
        Assert.Equal("err 5 no sweep\r\nbr-sa> ", Say("trace"));
        Say("go");
        Say("att 20");

        Assert.Equal("err 5 no sweep\r\nbr-sa> ", Say("trace"));
    }

    [Fact]
    public void Settings_ReachTheAnalyser()
    {
        Say("span 136000000 139000000");
        Say("rbw 30000");
        Say("att 20");
        Say("ref -10.5");
        Say("pts 4001");

        Assert.Equal((136e6, 139e6, 30e3, 20.0, -10.5, 4001),
            (_sa.Start.Hertz, _sa.Stop.Hertz, _sa.ResolutionBandwidth.Hertz, _sa.InputAttenuation.Decibels, _sa.ReferenceLevel.Dbm, _sa.Points));
    }

    [Theory]
    [InlineData("span 136000000", "err 2 wrong number of arguments")]
    [InlineData("trace all", "err 2 wrong number of arguments")]
    [InlineData("rbw wide", "err 4 not a number")]
    [InlineData("span 139000000 136000000", "err 3 value out of range")]
    [InlineData("span 50000 136000000", "err 3 value out of range")]
    [InlineData("rbw 99", "err 3 value out of range")]          // 100 Hz to 3 MHz
    [InlineData("rbw 3000001", "err 3 value out of range")]
    [InlineData("att 51", "err 3 value out of range")]          // 0 to 50 dB in whole decibels
    [InlineData("att -1", "err 3 value out of range")]
    [InlineData("att 10.5", "err 3 value out of range")]
    [InlineData("ref -100.01", "err 3 value out of range")]     // -100 to +20 dBm
    [InlineData("ref 20.01", "err 3 value out of range")]
    [InlineData("pts 10", "err 3 value out of range")]          // 11 to 4001
    [InlineData("pts 4002", "err 3 value out of range")]
    [InlineData("data s21", "err 1 unknown command")]
    public void RefusedCommand_IsAnsweredByItsErrorLine_AndChangesNothing(string command, string error)
    {
        var before = (_sa.Start, _sa.Stop, _sa.ResolutionBandwidth, _sa.InputAttenuation, _sa.ReferenceLevel, _sa.Points);

        Assert.Equal($"{error}\r\nbr-sa> ", Say(command));

        Assert.Equal(before, (_sa.Start, _sa.Stop, _sa.ResolutionBandwidth, _sa.InputAttenuation, _sa.ReferenceLevel, _sa.Points));
    }

    private string Say(string line) => Encoding.Latin1.GetString(_server.Handle(line));
}
