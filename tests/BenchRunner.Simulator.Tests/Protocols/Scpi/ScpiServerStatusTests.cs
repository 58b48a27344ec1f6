using BenchRunner.Simulator.Protocols.Scpi;
using BenchRunner.Simulator.Tests.Support;

namespace BenchRunner.Simulator.Tests.Protocols.Scpi;

// Error queue: SCPI-1999 Vol 2 §21.8 (numbers, texts, FIFO, -350 replacing the newest entry);
// event register: IEEE 488.2 §11.5.1 and the common commands of §10. Values as in REFERENCES.
public class ScpiServerStatusTests
{
    private readonly FakeSignalGenerator _generator = new();
    private readonly ScpiServer _server;

    public ScpiServerStatusTests()
    {
        _server = SignalGeneratorScpiTree.CreateServer(_generator, new ScpiDeviceStatus(queueCapacity: 4));
    }

    [Fact]
    public void EventStatus_AtPowerOn_HasOnlyPon_AndReadingClearsIt()
    {
        // IEEE 488.2 §11.5.1.1: PON is bit 7 (128); *ESR? clears the register (§10.12).
        Assert.Equal("128", _server.Ask("*ESR?"));
        Assert.Equal("0", _server.Ask("*ESR?"));
    }

    [Fact]
    public void UndefinedHeader_SetsCommandErrorBit32()
    {
        _server.Send("*CLS");
        _server.Send("SOURce:BOGus 1");

        // REFERENCES: *ESR? returns 32 after -113.
        Assert.Equal("32", _server.Ask("*ESR?"));
        var error = _server.NextError();
        Assert.Equal(-113, error.Code);
        Assert.Equal("Undefined header;SOURce:BOGus", error.Text);
    }

    [Fact]
    public void DataOutOfRange_SetsExecutionErrorBit16()
    {
        _server.Send("*CLS");
        _server.Send("SOURce:POWer 5");

        // REFERENCES: *ESR? returns 16 after -222.
        Assert.Equal("16", _server.Ask("*ESR?"));
        Assert.Equal(-222, _server.NextError().Code);
        Assert.Equal(-80, _generator.Level.Dbm);
    }

    [Fact]
    public void QueryUnterminated_SetsQueryErrorBit4()
    {
        _server.Send("*CLS");
        // A byte stream has no "read" request, so -420 cannot arise from traffic; it is reported directly.
        _server.Status.Report(ScpiStandardErrors.QueryUnterminated);

        // REFERENCES: *ESR? returns 4 after -420.
        Assert.Equal("4", _server.Ask("*ESR?"));
        Assert.Equal("-420,\"Query UNTERMINATED\"", _server.Ask("SYST:ERR?"));
    }

    [Fact]
    public void ErrorClasses_SetTheirOwnBits_AndCombine()
    {
        _server.Send("*CLS");
        _server.Status.Report(ScpiStandardErrors.QueryInterrupted);
        _server.Status.Report(new BenchRunner.Instruments.Scpi.ScpiError(-310, "System error"));
        _server.Send("OUTPut:STATe MAYBE");

        // QYE 4 for -410, DDE 8 for -310 "System error", EXE 16 for -224 (IEEE 488.2 §11.5.1.1; classes by SCPI-1999 Vol 2 §21.8, from memory).
        Assert.Equal((4 + 8 + 16).ToString(), _server.Ask("*ESR?"));
        Assert.Equal([-410, -310, -224], _server.DrainCodes());
    }

    [Fact]
    public void OperationComplete_StarOpcSetsBit1_AndStarOpcQueryAnswers1()
    {
        _server.Send("*CLS");
        _server.Send("*OPC");

        Assert.Equal("1", _server.Ask("*ESR?"));
        Assert.Equal("1", _server.Ask("*OPC?"));
        _server.Send("*WAI");
        Assert.Equal("0", _server.Ask("*ESR?"));
    }

    [Fact]
    public void ErrorQueue_Empty_AnswersZeroNoError()
    {
        _server.Send("*CLS");

        Assert.Equal("0,\"No error\"", _server.Ask("SYSTem:ERRor:NEXT?"));
        Assert.Equal("0,\"No error\"", _server.Ask("syst:err?"));
    }

    [Fact]
    public void ErrorQueue_IsFirstInFirstOut()
    {
        _server.Send("*CLS");
        _server.Send("BOGus");
        _server.Send("SOUR:POW 5");
        _server.Send("*IDN? 1");

        Assert.Equal("3", _server.Ask("SYST:ERR:COUN?"));
        Assert.Equal([-113, -222, -108], _server.DrainCodes());
        Assert.Equal("0", _server.Ask("SYST:ERR:COUN?"));
    }

    [Fact]
    public void ErrorQueue_Overflow_ReplacesTheNewestEntryWithMinus350()
    {
        _server.Send("*CLS");
        for (int i = 0; i < 6; i++)
        {
            _server.Send($"BOGus{i}");
        }

        // Four entries: the first three errors and, in place of the fourth, -350 "Queue overflow".
        var entries = Enumerable.Range(0, 5).Select(_ => _server.NextError()).ToList();
        Assert.Equal([-113, -113, -113, -350, 0], entries.Select(e => e.Code));
        Assert.Equal("Undefined header;BOGus0", entries[0].Text);
        Assert.Equal("Queue overflow", entries[3].Text);
    }

    [Fact]
    public void Clear_EmptiesTheQueueAndTheRegister()
    {
        _server.Send("BOGus");
        _server.Send("*CLS");

        Assert.Equal("0", _server.Ask("*ESR?"));
        Assert.Empty(_server.DrainCodes());
    }

    [Fact]
    public void Reset_LeavesTheStatusAlone()
    {
        _server.Send("*CLS");
        _server.Send("BOGus");
        _server.Send("*RST");

        Assert.Equal("32", _server.Ask("*ESR?"));
        Assert.Equal([-113], _server.DrainCodes());
    }

    [Fact]
    public void Version_IsScpi1999()
    {
        Assert.Equal("1999.0", _server.Ask("SYST:VERS?"));
    }

    [Fact]
    public void Status_QueueCapacityOutsideTwoToAThousand_IsRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new ScpiDeviceStatus(1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new ScpiDeviceStatus(1001));
    }
}
