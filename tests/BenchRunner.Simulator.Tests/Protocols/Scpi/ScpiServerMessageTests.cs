using System.Text;
using BenchRunner.Simulator.Protocols.Scpi;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Scpi;

// Program and response messages (IEEE 488.2 §7 and §8: units joined by ';', one LF at the end) and
// parameter errors (SCPI-1999 Vol 2 §21.8 numbers), against the generator's tree.
public class ScpiServerMessageTests
{
    private readonly FakeSignalGenerator _generator = new();
    private readonly ScpiServer _server;

    public ScpiServerMessageTests()
    {
        _server = SignalGeneratorScpiTree.CreateServer(_generator);
        _server.Send("*CLS");
    }

    [Fact]
    public void Handle_SeveralQueries_AnswersInOneLineJoinedBySemicolons()
    {
        // After SOUR:POW the path is SOURce, so POW? is SOURce:POWer? and :OUTP? starts again at the root.
        var bytes = _server.Handle("*IDN?;SOUR:POW -20;POW?;:OUTP?");

        Assert.Equal("benchrunner,sim-gen,SIM-GEN-0001,1.0;-20;0\n", Encoding.ASCII.GetString(bytes));
    }

    [Fact]
    public void Handle_CommandsOnly_SendNothing()
    {
        Assert.Empty(_server.Handle("SOUR:FREQ 137.5MHZ;:OUTP ON"));
        Assert.Equal(137.5e6, _generator.Frequency.Hertz);
        Assert.True(_generator.OutputOn);
    }

    [Fact]
    public void Handle_BlankMessageOrTrailingSemicolon_IsNothingToDo()
    {
        Assert.Empty(_server.Handle("   "));
        Assert.Equal("1", _server.Ask("*OPC?;"));
        Assert.Empty(_server.DrainCodes());
    }

    [Fact]
    public void Handle_EmptyUnitBetweenTwo_IsSyntaxError()
    {
        Assert.Equal("1", _server.Ask("*OPC?;;*OPC?"));
        Assert.Equal([-102], _server.DrainCodes());
    }

    [Fact]
    public void Handle_RepeatedFullHeaderWithoutColon_IsRelativeAndUndefined()
    {
        // SCPI-1999 Vol 1 §6.2.4 (from memory): SOUR:POW?, after SOUR:POW, means SOUR:SOUR:POW?.
        Assert.Equal("", _server.Ask("SOUR:POW -20;SOUR:POW?"));
        Assert.Equal([-113], _server.DrainCodes());
        Assert.Equal(-20, _generator.Level.Dbm);
    }

    [Fact]
    public void Handle_CommandError_SkipsTheRestOfTheMessage()
    {
        Assert.Equal("1", _server.Ask("*OPC?;BOGus;OUTP ON;*OPC?"));

        Assert.False(_generator.OutputOn);
        Assert.Equal([-113], _server.DrainCodes());
    }

    [Fact]
    public void Handle_ExecutionError_RunsTheNextUnit()
    {
        Assert.Equal("1", _server.Ask("SOUR:POW 5;:OUTP ON;*OPC?"));

        Assert.True(_generator.OutputOn);
        Assert.Equal([-222], _server.DrainCodes());
    }

    [Theory]
    [InlineData("137.5MHZ", 137.5e6)]
    [InlineData("137.5 MHz", 137.5e6)]     // MHZ means megahertz in any case (IEEE 488.2 §7.7.3.4, from memory)
    [InlineData("137.5mhz", 137.5e6)]
    [InlineData("137.5MAHZ", 137.5e6)]
    [InlineData("137500 kHz", 137.5e6)]
    [InlineData("1.375E8", 137.5e6)]
    [InlineData("1.375e+08 HZ", 137.5e6)]
    [InlineData("0.1375GHZ", 137.5e6)]
    [InlineData("137500000.4", 137.5e6)]   // rounded to the 1 Hz step
    public void Frequency_WithOrWithoutSuffix_IsTakenInHertz(string parameter, double hertz)
    {
        _server.Send("SOUR:FREQ " + parameter);

        Assert.Empty(_server.DrainCodes());
        Assert.Equal(hertz, _generator.Frequency.Hertz);
        Assert.Equal("137500000", _server.Ask("SOUR:FREQ?"));
    }

    [Theory]
    [InlineData("-20DBM", -20)]
    [InlineData("-20 dBm", -20)]
    [InlineData("-12.3456", -12.346)]      // rounded to the 0.001 dB step
    [InlineData("MIN", -80)]
    [InlineData("minimum", -80)]
    [InlineData("MAXimum", 0)]
    [InlineData("DEF", -80)]
    public void Level_NumberOrMinMaxDefault_IsSet(string parameter, double dbm)
    {
        _server.Send("SOURce:POWer:LEVel:IMMediate:AMPLitude " + parameter);

        Assert.Empty(_server.DrainCodes());
        Assert.Equal(dbm, _generator.Level.Dbm, 9);
    }

    [Theory]
    [InlineData("SOUR:POW? MIN", "-80")]
    [InlineData("SOUR:POW? MAX", "0")]
    [InlineData("SOUR:FREQ? MAX", "1500000000")]
    [InlineData("SOUR:FREQ? MIN", "100000")]
    [InlineData("SOUR:FREQ? DEF", "100000000")]
    public void Query_WithMinMaxDefault_AnswersTheRange(string query, string reply)
    {
        Assert.Equal(reply, _server.Ask(query));
    }

    [Theory]
    [InlineData("SOUR:POW", -109)]          // missing parameter
    [InlineData("SOUR:POW -20,-30", -108)]  // parameter not allowed
    [InlineData("*IDN? 1", -108)]
    [InlineData("*RST 1", -108)]
    [InlineData("SOUR:POW ON", -104)]       // data type error
    [InlineData("SOUR:POW 'x'", -104)]
    [InlineData("SOUR:FREQ 1DBM", -131)]    // invalid suffix
    [InlineData("SOUR:POW -20HZ", -131)]
    [InlineData("OUTP 1DB", -138)]          // suffix not allowed
    [InlineData("OUTP MAYBE", -224)]        // illegal parameter value
    [InlineData("SOUR:FREQ 2GHZ", -222)]    // data out of range
    [InlineData("SOUR:FREQ -1", -222)]
    [InlineData("SOUR:FREQ 1e999", -222)]
    [InlineData("OUTP2 ON", -114)]          // header suffix out of range
    [InlineData("SOUR2:FREQ 1e8", -114)]
    [InlineData("*IDN", -113)]
    [InlineData("*CLS?", -113)]
    [InlineData("OUTP:STAT:FOO ON", -113)]
    [InlineData("SOUR:FREQ 1e8 1e9", -102)]
    public void Parameters_Wrong_AreTheStandardErrors(string command, int code)
    {
        var before = (_generator.Frequency, _generator.Level, _generator.OutputOn);

        _server.Send(command);

        Assert.Equal([code], _server.DrainCodes());
        Assert.Equal(before, (_generator.Frequency, _generator.Level, _generator.OutputOn));
    }

    [Theory]
    [InlineData("ON", true)]
    [InlineData("off", false)]
    [InlineData("1", true)]
    [InlineData("0", false)]
    [InlineData("0.4", false)]   // IEEE 488.2 §7.7.1.3 (from memory): numbers are rounded, non-zero is ON
    [InlineData("-2", true)]
    public void Output_BooleanForms_AreAccepted(string parameter, bool on)
    {
        _server.Send("OUTP " + (on ? "OFF" : "ON"));
        _server.Send("OUTPut1:STATe " + parameter);

        Assert.Equal(on, _generator.OutputOn);
        Assert.Equal(on ? "1" : "0", _server.Ask("OUTP:STAT?"));
    }

    [Fact]
    public void Reset_PutsTheGeneratorBackInItsPowerOnState()
    {
        _server.Send("SOUR:FREQ 137.5MHZ;POW -10;:OUTP ON");
        _server.Send("*RST");

        Assert.False(_generator.OutputOn);
        Assert.Equal(-80, _generator.Level.Dbm);
        Assert.Equal("0", _server.Ask("OUTP?"));
    }

    [Fact]
    public void Handle_Garbage_IsReportedAndNeverThrows()
    {
        var random = new Random(20240137);
        for (int i = 0; i < 500; i++)
        {
            var chars = new char[random.Next(1, 60)];
            for (int c = 0; c < chars.Length; c++)
            {
                chars[c] = (char)random.Next(0, 256);
            }

            _server.Handle(new string(chars));
        }

        _server.Send("*CLS");
        Assert.Equal("1", _server.Ask("*OPC?"));
        Assert.Empty(_server.DrainCodes());
    }
}
