using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Scpi;

public class ScpiSessionTests
{
    private static readonly CancellationToken None = CancellationToken.None;

    private static async Task<(ScriptedScpiDevice Device, ScpiSession Session)> OpenAsync(ScpiSessionOptions? options = null)
    {
        var (device, host) = ScriptedScpiDevice.Start();
        var session = new ScpiSession("vna", host, options);
        await session.OpenAsync(None).Bounded();
        return (device, session);
    }

    private static int Count(ScriptedScpiDevice device, string command) => device.Received.Count(c => c == command);

    [Fact]
    public async Task IdentifyAsync_FourFields_GivesMakerModelSerialAndFirmware()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;

        var identity = await session.IdentifyAsync(None).Bounded();

        // IEEE 488.2 §10.14: manufacturer, model, serial number, firmware level; "0" when unavailable.
        Assert.Equal(new("Demo Bench Works", "Virtual Analyser 2", "0", "1.0.3"), identity);
    }

    [Fact]
    public async Task IdentifyAsync_NotAnIdentification_ThrowsNamingInstrumentCommandAndReply()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.Identity = "READY";

        var error = await Assert.ThrowsAsync<InstrumentException>(() => session.IdentifyAsync(None).Bounded());

        Assert.Equal(("vna", "*IDN?", "READY"), (error.Instrument, error.Command, error.Reply));
        Assert.False(error.IsTransient);
        Assert.Equal(SessionState.Ready, session.State);
    }

    [Fact]
    public async Task WriteAsync_UndefinedHeader_RaisesTheReportedErrorAgainstTheCommand()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;

        var error = await Assert.ThrowsAsync<InstrumentReportedException>(() => session.WriteAsync("SENSe:FREQuency:STRAt 137000000", None).Bounded());

        // -113 "Undefined header": SCPI-1999 Vol 2 §21.8 (REFERENCES).
        Assert.Equal((-113, "Undefined header"), (error.Code, error.Text));
        Assert.Equal(("vna", "SENSe:FREQuency:STRAt 137000000", "-113,\"Undefined header\""), (error.Instrument, error.Command, error.Reply));
        Assert.StartsWith("vna: the instrument reported error -113 \"Undefined header\"", error.Message);
        Assert.False(error.IsTransient);
        Assert.Equal(SessionState.Ready, session.State);
    }

    [Fact]
    public async Task WriteAsync_DataOutOfRange_RaisesIt()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.Script("SOURce:POWer", _ =>
        {
            // -222 "Data out of range": SCPI-1999 Vol 2 §21.8 (REFERENCES).
            device.PushError(-222, "Data out of range");
            return Task.FromResult<byte[]?>(null);
        });

        var error = await Assert.ThrowsAsync<InstrumentReportedException>(() => session.WriteAsync("SOURce:POWer 30", None).Bounded());

        Assert.Equal((-222, "Data out of range"), (error.Code, error.Text));
        Assert.Equal("SOURce:POWer 30", error.Command);
    }

    [Theory]
    [InlineData("+0,\"No error\"")]
    [InlineData("0,\"No error\"")]
    [InlineData("0,\"Queue is empty\"")]
    public async Task QueryAsync_EmptyQueueInAnyForm_ReturnsTheReply(string noError)
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.NoErrorReply = noError;
        device.Answer("SENSe:FREQuency:STARt?", "1.36E+08");

        var reply = await session.QueryAsync("SENSe:FREQuency:STARt?", None).Bounded();

        Assert.Equal("1.36E+08", reply);
        Assert.Equal(["SENSe:FREQuency:STARt?", "SYSTem:ERRor?"], device.Received);
    }

    [Fact]
    public async Task WriteAsync_SeveralErrors_ListsEveryOneInTheMessage()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.Script("SENSe:SWEep:POINts", _ =>
        {
            device.PushError(-222, "Data out of range");
            device.PushError(-221, "Settings conflict");
            return Task.FromResult<byte[]?>(null);
        });

        var error = await Assert.ThrowsAsync<InstrumentReportedException>(() => session.WriteAsync("SENSe:SWEep:POINts 100001", None).Bounded());

        Assert.Equal(-222, error.Code);
        Assert.Contains("reported 2 errors: -222 \"Data out of range\"; -221 \"Settings conflict\"", error.Message);
        Assert.Equal(3, Count(device, "SYSTem:ERRor?"));
    }

    [Fact]
    public async Task Drain_QueueOverflowed_ReportsTheKeptErrorsAndTheLoss()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.ErrorQueueCapacity = 3;
        device.Script("CALCulate:MARKer", _ =>
        {
            for (int i = 0; i < 5; i++)
            {
                device.PushError(-222, "Data out of range");
            }

            return Task.FromResult<byte[]?>(null);
        });

        var error = await Assert.ThrowsAsync<InstrumentReportedException>(() => session.WriteAsync("CALCulate:MARKer 1", None).Bounded());

        // SCPI-1999: a full queue has its newest entry replaced by -350 "Queue overflow" (REFERENCES).
        Assert.Equal(-222, error.Code);
        Assert.Contains("reported 3 errors", error.Message);
        Assert.Contains("-350 \"Queue overflow\"", error.Message);
        Assert.Contains("later errors were lost", error.Message);
        Assert.Equal(4, Count(device, "SYSTem:ERRor?"));
    }

    [Fact]
    public async Task Drain_OnlyAnOverflowEntry_ReportsThe350()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.Script("TRIGger:SOURce", _ =>
        {
            device.PushError(-350, "Queue overflow");
            return Task.FromResult<byte[]?>(null);
        });

        var error = await Assert.ThrowsAsync<InstrumentReportedException>(() => session.WriteAsync("TRIGger:SOURce BUS", None).Bounded());

        Assert.Equal(-350, error.Code);
    }

    [Fact]
    public async Task Drain_QueueNeverEmpties_GivesUpAfterTheCap()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.NeverEmptiesErrorQueue = true;
        device.PushError(-200, "Execution error");
        device.Accept("SENSe:AVERage:COUNt");

        var error = await Assert.ThrowsAsync<InstrumentException>(() => session.WriteAsync("SENSe:AVERage:COUNt 4", None).Bounded());

        Assert.Contains("still not empty after 32 reads", error.Message);
        Assert.Equal("SENSe:AVERage:COUNt 4", error.Command);
        Assert.Equal(32, Count(device, "SYSTem:ERRor?"));
        Assert.Equal(SessionState.Ready, session.State);
    }

    [Fact]
    public async Task Drain_CapFromOptions_IsHonoured()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { MaxErrorReads = 5 });
        await using var _ = device;
        await using var __ = session;
        device.NeverEmptiesErrorQueue = true;
        device.PushError(-200, "Execution error");

        await Assert.ThrowsAsync<InstrumentException>(() => session.QueryAsync("*IDN?", None).Bounded());

        Assert.Equal(5, Count(device, "SYSTem:ERRor?"));
    }

    [Fact]
    public async Task DrainErrorsOff_SendsNoErrorQuery_AndReadErrorsReturnsTheEntries()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { DrainErrors = false });
        await using var _ = device;
        await using var __ = session;

        await session.WriteAsync("SENSe:FREQuency:STRAt 1", None).Bounded();
        Assert.DoesNotContain("SYSTem:ERRor?", device.Received);

        var errors = await session.ReadErrorsAsync(None).Bounded();

        Assert.Equal([new ScpiError(-113, "Undefined header")], errors);
    }

    [Fact]
    public async Task ReadEventStatusAsync_AfterUndefinedHeader_Gives32AndClears()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        await Assert.ThrowsAsync<InstrumentReportedException>(() => session.WriteAsync("NOSuch:HEADer", None).Bounded());

        // *ESR? returns 32 (CME) after -113 and is cleared by reading (REFERENCES: IEEE 488.2 §10.12).
        Assert.Equal(32, await session.ReadEventStatusAsync(None).Bounded());
        Assert.Equal(0, await session.ReadEventStatusAsync(None).Bounded());
    }

    [Fact]
    public async Task ClearStatusAsync_EmptiesTheQueueWithoutDraining()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { DrainErrors = false });
        await using var _ = device;
        await using var __ = session;
        device.PushError(-222, "Data out of range");

        await session.ClearStatusAsync(None).Bounded();

        Assert.Empty(await session.ReadErrorsAsync(None).Bounded());
        Assert.Equal(["*CLS", "SYSTem:ERRor?"], device.Received);
    }

    [Fact]
    public async Task WaitForCompletionAsync_SweepLongerThanCommandTimeout_UsesTheCompletionTimeout()
    {
        var options = new ScpiSessionOptions { CommandTimeout = TimeSpan.FromMilliseconds(100), CompletionTimeout = TimeSpan.FromSeconds(5) };
        var (device, session) = await OpenAsync(options);
        await using var _ = device;
        await using var __ = session;
        device.OpcDelay = TimeSpan.FromMilliseconds(400);

        await session.WaitForCompletionAsync(None).Bounded();

        Assert.Equal(SessionState.Ready, session.State);
        Assert.Equal(["*OPC?", "SYSTem:ERRor?"], device.Received);
    }

    [Fact]
    public async Task WaitForCompletionAsync_SweepLongerThanCompletionTimeout_TimesOutAndBreaks()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { CompletionTimeout = TimeSpan.FromMilliseconds(100) });
        await using var _ = device;
        await using var __ = session;
        device.OpcDelay = TimeSpan.FromSeconds(3);

        var error = await Assert.ThrowsAsync<InstrumentTimeoutException>(() => session.WaitForCompletionAsync(None).Bounded());

        Assert.Equal(("vna", "*OPC?"), (error.Instrument, error.Command));
        Assert.True(error.IsTransient);
        Assert.Equal(SessionState.Broken, session.State);
    }

    [Fact]
    public async Task WaitForCompletionAsync_AnswerOtherThanOne_IsLostSync()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.Answer("*OPC?", "+1.36E+08");

        var error = await Assert.ThrowsAsync<FramingException>(() => session.WaitForCompletionAsync(None).Bounded());

        Assert.Equal("+1.36E+08", error.Reply);
        Assert.Equal(SessionState.Broken, session.State);
    }

    [Fact]
    public async Task QueryAsync_NoReply_TimesOutAndLeavesTheSessionBroken()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { CommandTimeout = TimeSpan.FromMilliseconds(150) });
        await using var _ = device;
        await using var __ = session;
        device.Silent("SENSe:FREQuency:STARt?");

        var error = await Assert.ThrowsAsync<InstrumentTimeoutException>(() => session.QueryAsync("SENSe:FREQuency:STARt?", None).Bounded());

        Assert.Equal(("vna", "SENSe:FREQuency:STARt?", ""), (error.Instrument, error.Command, error.Reply));
        Assert.Contains("no complete reply within 150 ms", error.Message);
        Assert.Equal(SessionState.Broken, session.State);
    }

    [Fact]
    public async Task Broken_RefusesWork_AndSendsNothing()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { CommandTimeout = TimeSpan.FromMilliseconds(150) });
        await using var _ = device;
        await using var __ = session;
        device.Silent("SENSe:FREQuency:STARt?");
        await Assert.ThrowsAsync<InstrumentTimeoutException>(() => session.QueryAsync("SENSe:FREQuency:STARt?", None).Bounded());

        var error = await Assert.ThrowsAsync<InstrumentException>(() => session.WriteAsync("OUTPut:STATe ON", None).Bounded());

        Assert.Contains("refuses work until it is reset", error.Message);
        Assert.Equal(("vna", "OUTPut:STATe ON"), (error.Instrument, error.Command));
        Assert.Equal(SessionState.Broken, session.State);
        Assert.DoesNotContain("OUTPut:STATe ON", device.Received);
    }

    [Fact]
    public async Task ResetAsync_AfterTimeout_BringsTheSessionBackInStep()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { CommandTimeout = TimeSpan.FromMilliseconds(150) });
        await using var _ = device;
        await using var __ = session;
        device.Silent("SENSe:FREQuency:STARt?");
        await Assert.ThrowsAsync<InstrumentTimeoutException>(() => session.QueryAsync("SENSe:FREQuency:STARt?", None).Bounded());

        await session.ResetAsync(None).Bounded();

        Assert.Equal(SessionState.Ready, session.State);
        Assert.Equal(["SENSe:FREQuency:STARt?", "*CLS", "*OPC?", "*IDN?"], device.Received);
        Assert.Equal("0", await session.QueryAsync("*ESR?", None).Bounded());
    }

    [Fact]
    public async Task ResetAsync_LateReplyOfTheTimedOutQuery_IsSkipped()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { CommandTimeout = TimeSpan.FromMilliseconds(150) });
        await using var _ = device;
        await using var __ = session;
        var release = device.AnswerLate("CALCulate:MARKer:Y?", "-3.25");
        await Assert.ThrowsAsync<InstrumentTimeoutException>(() => session.QueryAsync("CALCulate:MARKer:Y?", None).Bounded());

        var reset = session.ResetAsync(None);
        release.SetResult();
        await reset.Bounded();

        Assert.Equal("0", await session.QueryAsync("*ESR?", None).Bounded());
        Assert.Equal(SessionState.Ready, session.State);
    }

    [Fact]
    public async Task ResetAsync_LateOneFromATimedOutOpc_IsNotTakenForItsOwn()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { CompletionTimeout = TimeSpan.FromMilliseconds(300) });
        await using var _ = device;
        await using var __ = session;
        var sweepDone = device.AnswerLate("*OPC?", "1");
        await Assert.ThrowsAsync<InstrumentTimeoutException>(() => session.WaitForCompletionAsync(None).Bounded());

        // The old *OPC? answers "1" first, then the reset's own *OPC? answers "1".
        var reset = session.ResetAsync(None);
        sweepDone.SetResult();
        await reset.Bounded();

        Assert.Equal("0", await session.QueryAsync("*ESR?", None).Bounded());
        Assert.Equal(2, device.Sent.Count(b => b is [(byte)'1', (byte)'\n']));
    }

    [Fact]
    public async Task ResetAsync_NoAnswer_StaysBroken()
    {
        var (device, session) = await OpenAsync(new ScpiSessionOptions { CommandTimeout = TimeSpan.FromMilliseconds(100), CompletionTimeout = TimeSpan.FromMilliseconds(200) });
        await using var _ = device;
        await using var __ = session;
        device.Silent("*OPC?");
        await Assert.ThrowsAsync<InstrumentTimeoutException>(() => session.WaitForCompletionAsync(None).Bounded());

        await Assert.ThrowsAsync<InstrumentTimeoutException>(() => session.ResetAsync(None).Bounded());

        Assert.Equal(SessionState.Broken, session.State);
    }

    [Fact]
    public async Task QueryBlockAsync_ReturnsThePayload()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.AnswerRaw("TRACe:DATA? S21", [.. "#14"u8, 0x3F, 0x80, 0x00, 0x00, (byte)'\n']);

        var payload = await session.QueryBlockAsync("TRACe:DATA? S21", None).Bounded();

        Assert.Equal(new byte[] { 0x3F, 0x80, 0x00, 0x00 }, payload);
        Assert.Equal(SessionState.Ready, session.State);
    }

    [Fact]
    public async Task QueryBlockAsync_MalformedHeader_IsLostSyncAndBreaks()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.AnswerRaw("TRACe:DATA? S21", "#9abcdefghi\n"u8.ToArray());

        var error = await Assert.ThrowsAsync<FramingException>(() => session.QueryBlockAsync("TRACe:DATA? S21", None).Bounded());

        Assert.Equal(("vna", "TRACe:DATA? S21"), (error.Instrument, error.Command));
        Assert.Equal(SessionState.Broken, session.State);
    }

    [Fact]
    public async Task Drain_GarbledErrorEntry_IsLostSyncAndBreaks()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;
        await using var __ = session;
        device.Answer("SYSTem:ERRor?", "1.36E+08");
        device.Accept("SENSe:FREQuency:STARt");

        var error = await Assert.ThrowsAsync<FramingException>(() => session.WriteAsync("SENSe:FREQuency:STARt 136000000", None).Bounded());

        Assert.Equal(("SYSTem:ERRor?", "1.36E+08"), (error.Command, error.Reply));
        Assert.Equal(SessionState.Broken, session.State);
    }

    [Fact]
    public async Task Closed_RefusesWork()
    {
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;
        await using var session = new ScpiSession("vna", host);

        await Assert.ThrowsAsync<InvalidOperationException>(() => session.WriteAsync("*CLS", None).Bounded());
        await Assert.ThrowsAsync<InvalidOperationException>(() => session.ResetAsync(None).Bounded());
        Assert.Equal(SessionState.Closed, session.State);
    }

    [Fact]
    public async Task CloseAsync_ThenWork_IsRefused()
    {
        var (device, session) = await OpenAsync();
        await using var _ = device;

        await session.CloseAsync().Bounded();

        Assert.Equal(SessionState.Closed, session.State);
        await Assert.ThrowsAsync<InvalidOperationException>(() => session.QueryAsync("*IDN?", None).Bounded());
    }

    [Fact]
    public void Constructor_InvalidOptions_ListsEveryProblem()
    {
        var (_, host) = BenchRunner.Instruments.Transports.InMemoryTransport.CreatePair();
        var options = new ScpiSessionOptions { CommandTimeout = TimeSpan.Zero, MaxErrorReads = 0, ErrorQuery = "SYSTem:ERRor" };

        var error = Assert.Throws<ArgumentException>(() => new ScpiSession("vna", host, options));

        Assert.Contains("command timeout", error.Message);
        Assert.Contains("error-queue reads", error.Message);
        Assert.Contains("must be a query", error.Message);
    }
}
