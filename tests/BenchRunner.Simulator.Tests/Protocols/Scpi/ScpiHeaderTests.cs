using BenchRunner.Simulator.Protocols.Scpi;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Scpi;

// Header matching by the rules of SCPI-1999 Vol 1 ch. 6 (keywords, short and long forms, optional
// nodes, numeric suffixes, header paths) and IEEE 488.2 §7.6 (program headers), from memory; the
// rules are summarised in REFERENCES ("SCPI headers").
public class ScpiHeaderTests
{
    private readonly List<string> _calls = [];
    private readonly ScpiServer _server;

    public ScpiHeaderTests()
    {
        var tree = new ScpiCommandTree()
            .Command("[SENSe]:FREQuency:STARt", c => _calls.Add($"start {c.Number(0, ScpiUnit.Hertz)}"))
            .Command("[SENSe]:FREQuency:STOP", c => _calls.Add($"stop {c.Number(0, ScpiUnit.Hertz)}"))
            .Command("[SOURce#]:VOLTage[:LEVel]", c => _calls.Add($"volt{c.Suffixes[0]} {c.Number(0, ScpiUnit.None)}"))
            .Query("[SOURce#]:VOLTage[:LEVel]?", c => ScpiResponse.Integer(c.Suffixes[0]))
            .Command("OUTPut:PROTection:CLEar", _ => _calls.Add("clear"));
        _server = new ScpiServer(tree);
        _server.Send("*CLS");
    }

    [Theory]
    [InlineData("VOLT 5")]
    [InlineData("VOLTAGE 5")]
    [InlineData("volt 5")]
    [InlineData("Voltage:Level 5")]
    [InlineData("VOLT:LEV 5")]
    [InlineData("SOUR:VOLT 5")]
    [InlineData("SOURCE:VOLTAGE:LEVEL 5")]
    [InlineData(":SOUR1:VOLT:LEV 5")]
    public void Header_ShortOrLongFormInAnyCase_WithOrWithoutOptionalNodes_IsAccepted(string command)
    {
        _server.Send(command);

        Assert.Equal(["volt1 5"], _calls);
        Assert.Empty(_server.DrainCodes());
    }

    [Theory]
    [InlineData("VOL 5")]        // neither the short form VOLT nor the long form VOLTAGE
    [InlineData("VOLTA 5")]
    [InlineData("VOLTAGES 5")]
    [InlineData("SOUR:LEV 5")]   // the optional node LEVel cannot stand without VOLTage
    [InlineData("SOURC:VOLT 5")]
    [InlineData("OUTP:CLE")]     // PROTection is not optional
    public void Header_AnythingElse_IsUndefinedHeader(string command)
    {
        _server.Send(command);

        Assert.Empty(_calls);
        var error = _server.NextError();
        // REFERENCES: SCPI-1999 Vol 2 §21.8, -113 "Undefined header".
        Assert.Equal(-113, error.Code);
        Assert.StartsWith("Undefined header", error.Text);
    }

    [Fact]
    public void Header_NumericSuffix_ReachesTheHandler_AndOmittedMeansOne()
    {
        Assert.Equal("2", _server.Ask("SOUR2:VOLT?"));
        Assert.Equal("1", _server.Ask("SOUR:VOLT?"));
        Assert.Equal("1", _server.Ask("VOLT?"));
        _server.Send("SOURCE3:VOLTAGE 7");

        Assert.Equal(["volt3 7"], _calls);
    }

    [Fact]
    public void Header_SuffixOnAKeywordWithout_IsUndefinedHeader()
    {
        _server.Send("VOLT2 5");

        Assert.Equal(-113, _server.NextError().Code);
        Assert.Empty(_calls);
    }

    [Fact]
    public void Message_FollowingHeaderWithoutColon_IsRelativeToThePreviousPath()
    {
        // SCPI-1999 Vol 1 §6.2.4 (from memory): after SENS:FREQ:STAR the path is SENS:FREQ, so STOP is SENS:FREQ:STOP.
        _server.Send("SENS:FREQ:STAR 136MHZ;STOP 139MHZ");

        Assert.Equal(["start 136000000", "stop 139000000"], _calls);
        Assert.Empty(_server.DrainCodes());
    }

    [Fact]
    public void Message_PathThroughAnOmittedOptionalNode_IsKeptToo()
    {
        _server.Send("FREQ:STAR 136e6;STOP 139e6");

        Assert.Equal(["start 136000000", "stop 139000000"], _calls);
    }

    [Fact]
    public void Message_FullHeaderRepeatedWithoutColon_IsUndefinedRelativeToThePath()
    {
        _server.Send("SENS:FREQ:STAR 136e6;SENS:FREQ:STOP 139e6");

        Assert.Equal(["start 136000000"], _calls);
        Assert.Equal([-113], _server.DrainCodes());
    }

    [Fact]
    public void Message_LeadingColon_ReturnsToTheRoot()
    {
        _server.Send("SENS:FREQ:STAR 136e6;:VOLT 3;:SENS:FREQ:STOP 139e6");

        Assert.Equal(["start 136000000", "volt1 3", "stop 139000000"], _calls);
    }

    [Fact]
    public void Message_CommonCommandInBetween_LeavesThePathAlone()
    {
        // IEEE 488.2 §A.1.1 / SCPI-1999 Vol 1 §6.2.4 (from memory): common commands may appear anywhere and do not move the path.
        Assert.Equal("1", _server.Ask("SENS:FREQ:STAR 136e6;*OPC?;STOP 139e6"));

        Assert.Equal(["start 136000000", "stop 139000000"], _calls);
    }

    [Fact]
    public void Message_EachNewLine_StartsAtTheRoot()
    {
        _server.Send("SENS:FREQ:STAR 136e6");
        _server.Send("STOP 139e6");

        Assert.Equal([-113], _server.DrainCodes());
    }

    [Fact]
    public void Message_QueryOfACommandOnlyHeader_IsUndefinedHeader()
    {
        _server.Send("SENS:FREQ:STAR?");

        Assert.Equal([-113], _server.DrainCodes());
    }

    [Theory]
    [InlineData("FREQ?")]
    [InlineData("fREQuency")]
    [InlineData("FREQuEncy")]
    [InlineData("[SENSe:FREQuency")]
    [InlineData("SENSe:FREQ1")]
    [InlineData("*idn")]
    public void Command_MalformedDeclaration_IsRefused(string header)
    {
        Assert.Throws<ArgumentException>(() => new ScpiCommandTree().Command(header, _ => { }));
    }

    [Fact]
    public void Command_DeclaredTwiceOrWithAConflictingNode_IsRefused()
    {
        var tree = new ScpiCommandTree().Command("[SENSe]:FREQuency:STARt", _ => { });

        Assert.Throws<ArgumentException>(() => tree.Command("SENSe:FREQuency:STARt", _ => { }));
        Assert.Throws<ArgumentException>(() => tree.Command("[SENSe]:FREQuency:STARt", _ => { }));
        Assert.Throws<ArgumentException>(() => tree.Query("[SENSe]:FREQuency:STARt", _ => ScpiResponse.Integer(0)));
        tree.Query("[SENSe]:FREQuency:STARt?", _ => ScpiResponse.Integer(0));
        Assert.Contains("[SENSe]:FREQuency:STARt?", tree.Headers);
    }
}
