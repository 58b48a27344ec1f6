using System.Text;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Resilience;
using BenchRunner.Instruments.Scpi;
using BenchRunner.Instruments.Tests.Kinds.Attenuator;
using BenchRunner.Instruments.Tests.Profiles;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;

namespace BenchRunner.Instruments.Tests.Kinds;

// A kind added through its descriptor alone: the toy step attenuator (Kinds/Attenuator) is read from
// both kinds of profile, spoken to by both adapters, and reconnected by the resilience layer, with
// no change to any of them.
public sealed class StepAttenuatorKindTests
{
    private static readonly CancellationToken None = CancellationToken.None;
    private static readonly InstrumentKindRegistry Kinds = InstrumentKindRegistry.BuiltIn.AddStepAttenuator();

    private static readonly string RawProfile = ProfileText.Lines(
        "profile: bench-att",                                  // 1
        "kinds: [step-attenuator]",                            // 2
        "framing: {prompt: 'att> '}",                          // 3
        "identity: {maker: workshop, model: step-att}",        // 4
        "limits: {max-input-level: 20 dBm}",                   // 5
        "step-attenuator:",                                    // 6
        "  set: att {attenuation:db}",                         // 7
        "  query: att?",                                       // 8
        "  reply: '^att (?<db>\\d+(\\.\\d+)?)$'");             // 9

    private static readonly string ScpiProfile = ProfileText.Lines(
        "profile: bench-att-scpi",                             // 1
        "adapter: scpi",                                       // 2
        "kinds: [step-attenuator]",                            // 3
        "step-attenuator:",                                    // 4
        "  set: INPut:ATTenuation {db}");                      // 5

    [Fact]
    public void Parse_RawProfileNamingTheToyKind_ReadsItsSection()
    {
        var profile = DriverProfile.Parse(RawProfile, "att.yaml", Kinds);

        Assert.Equal([StepAttenuatorKind.Instance], profile.Kinds);
        var section = profile.SectionOf<StepAttenuatorCommands>(StepAttenuatorKind.Instance);
        Assert.NotNull(section);
        Assert.Equal("att {attenuation:db}", section.Set.Text);
        Assert.Equal(Level.FromDbm(20), profile.Limits.MaxInputLevel);
    }

    [Fact]
    public void Parse_ToyKindWithTheBuiltInRegistry_IsAnUnknownKindListingTheBuiltInOnes()
    {
        var error = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(RawProfile, "att.yaml"));

        Assert.Contains(error.Problems, p => p.Location == new SourceLocation("att.yaml", 2, 9)
            && p.Detail == "unknown value \"step-attenuator\" for \"kinds\"; expected one of network-analyser, spectrum-analyser, signal-generator");
    }

    [Fact]
    public void Parse_ToySectionWithAnUnknownPlaceholder_ReportsItsPlace()
    {
        var text = RawProfile.Replace("att {attenuation:db}", "att {level}", StringComparison.Ordinal);

        var error = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, "att.yaml", Kinds));

        var problem = Assert.Single(error.Problems);
        Assert.Equal(7, problem.Location.Line);
        Assert.Contains("level", problem.Detail);
    }

    [Fact]
    public void Parse_ScpiProfileWithABadToyCommand_ReportsItAtTheCommand()
    {
        var text = ScpiProfile.Replace("{db}", "{hz}", StringComparison.Ordinal);

        var error = Assert.Throws<InputFormatException>(() => DriverProfile.Parse(text, "att.yaml", Kinds));

        var problem = Assert.Single(error.Problems);
        Assert.Equal(new SourceLocation("att.yaml", 5, 8), problem.Location);
        Assert.StartsWith("\"set\" in \"step-attenuator\": ", problem.Detail);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public async Task RawAdapter_ToyKind_SetsAndReadsBackOverAScriptedPeer(bool prompted)
    {
        // Without a prompt, a setting draws no reply and a query's reply is its next line.
        var text = prompted ? RawProfile : RawProfile.Replace("framing: {prompt: 'att> '}", "framing: {}", StringComparison.Ordinal);
        var (host, device) = InMemoryTransport.CreatePair("att");
        await using var peer = new ScriptedPeer(device, "\n", new AttenuatorDialect().Handle, prompt: prompted ? "att> " : null);
        await using var instrument = InstrumentAdapterFactory.Create("att", DriverProfile.Parse(text, "att.yaml", Kinds), host);
        await instrument.ConnectAsync(None).Bounded();
        var attenuator = instrument.GetCapability<IStepAttenuator>();
        Assert.NotNull(attenuator);

        await attenuator.SetAttenuationAsync(Ratio.FromDecibels(10), None).Bounded();
        var read = await attenuator.ReadAttenuationAsync(None).Bounded();

        Assert.IsType<ProfileInstrument>(instrument);
        Assert.Equal(10, read.Decibels);
        Assert.Equal(["att 10", "att?"], peer.Received);
        Assert.Null(instrument.GetCapability<INetworkAnalyser>());
    }

    [Fact]
    public async Task RawAdapter_UnreadableReply_IsATransientErrorNamingCommandAndReply()
    {
        var (host, device) = InMemoryTransport.CreatePair("att");
        await using var peer = new ScriptedPeer(device, "\n", line => line == "att?" ? ["attenuation unknown"] : [], prompt: "att> ");
        await using var instrument = InstrumentAdapterFactory.Create("att", DriverProfile.Parse(RawProfile, "att.yaml", Kinds), host);
        await instrument.ConnectAsync(None).Bounded();

        var error = await Assert.ThrowsAsync<Errors.InstrumentException>(
            () => instrument.GetCapability<IStepAttenuator>()!.ReadAttenuationAsync(None).Bounded());

        Assert.True(error.IsTransient);
        Assert.Equal(("att", "att?", "attenuation unknown"), (error.Instrument, error.Command, error.Reply));
    }

    [Fact]
    public async Task ScpiAdapter_ToyKind_SetsAndReadsBackOverAScriptedScpiPeer()
    {
        var (device, host) = ScriptedScpiDevice.Start();
        await using var _ = device;
        device.Accept("INPut:ATTenuation");
        device.Script("ATTenuation?", _ => Task.FromResult<byte[]?>(Encoding.Latin1.GetBytes(device.Setting("INPut:ATTenuation") + "\n")));
        var profile = DriverProfile.Parse(ScpiProfile, "att.yaml", Kinds);

        await using var instrument = InstrumentAdapterFactory.Create("att", profile, host);
        await instrument.ConnectAsync(None).Bounded();
        var attenuator = instrument.GetCapability<IStepAttenuator>()!;
        await attenuator.SetAttenuationAsync(Ratio.FromDecibels(30), None).Bounded();
        var read = await attenuator.ReadAttenuationAsync(None).Bounded();

        Assert.IsType<ScpiInstrument>(instrument);
        Assert.Equal(30, read.Decibels);
        // The section leaves "query" out, so its default is sent; no trace is fetched, so no data format is chosen.
        Assert.Equal(["*CLS", "*IDN?", "INPut:ATTenuation 30", "ATTenuation?"], device.Received.Where(c => c != "SYSTem:ERRor?"));
    }

    [Fact]
    public async Task ScpiCommandSet_ToySectionGivenInCode_IsCheckedAndBuilt()
    {
        var bad = new ScpiCommandSet { Sections = new Dictionary<InstrumentKind, IScpiCommandSection>
        {
            [StepAttenuatorKind.Instance] = new ScpiStepAttenuatorCommands { Enabled = true, Set = "ATTenuation {hz}" },
        } };
        var good = new ScpiCommandSet { Sections = new Dictionary<InstrumentKind, IScpiCommandSection>
        {
            [StepAttenuatorKind.Instance] = new ScpiStepAttenuatorCommands { Enabled = true },
        } };
        var (host, _) = InMemoryTransport.CreatePair("att");

        await using var instrument = new ScpiInstrument("att", host, good);

        Assert.Contains(bad.Problems(), p => p.StartsWith("attenuator.set:", StringComparison.Ordinal) && p.Contains("{db}"));
        Assert.Empty(good.Problems());
        Assert.Equal(4, good.Sections.Count);
        var defaults = Assert.IsType<ScpiStepAttenuatorCommands>(new ScpiCommandSet(Kinds).Sections[StepAttenuatorKind.Instance]);
        Assert.Equal(("ATTenuation {db}", false), (defaults.Set, defaults.Enabled));
        Assert.Equal(3, new ScpiCommandSet().Sections.Count);
        Assert.True(StepAttenuatorKind.Instance.IsOfferedBy(instrument));
        Assert.False(InstrumentKind.NetworkAnalyser.IsOfferedBy(instrument));
        Assert.False(good.FetchesTraces);
    }

    [Fact]
    public async Task ResilientInstrument_ToyKindLosingItsConnection_ReconnectsSetsTheAttenuationAgainAndReads()
    {
        var profile = DriverProfile.Parse(RawProfile, "att.yaml", Kinds);
        var peers = new List<ScriptedPeer>();
        var dialect = new AttenuatorDialect();
        IInstrument Connect()
        {
            var (host, device) = InMemoryTransport.CreatePair("att");
            peers.Add(new ScriptedPeer(device, "\n", dialect.Handle, prompt: "att> "));
            // The first connection goes away in the reply to its second command, as an unplugged cable would.
            ITransport transport = peers.Count == 1 ? new FaultInjectingTransport(host, new FaultScript().Disconnect(reply: 2)) : host;
            return InstrumentAdapterFactory.Create("att", profile, transport);
        }

        try
        {
            await using var att = new ResilientInstrument("att", Connect, kinds: Kinds);
            await att.ConnectAsync(None).Bounded();
            var attenuator = att.GetCapability<IStepAttenuator>()!;
            await attenuator.SetAttenuationAsync(Ratio.FromDecibels(10), None).Bounded();

            var read = await attenuator.ReadAttenuationAsync(None).Bounded();

            Assert.Equal(10, read.Decibels);
            Assert.Equal(2, att.ConnectionCount);
            Assert.Equal(["att 10", "att?"], peers[0].Received);
            Assert.Equal(["att 10", "att?"], peers[1].Received);
        }
        finally
        {
            foreach (var peer in peers)
            {
                await peer.DisposeAsync();
            }
        }
    }

    [Fact]
    public async Task ResilientInstrument_BuiltInRegistry_HasNoWrapperForTheToyCapability()
    {
        var (host, device) = InMemoryTransport.CreatePair("att");
        await using var peer = new ScriptedPeer(device, "\n", new AttenuatorDialect().Handle, prompt: "att> ");
        var profile = DriverProfile.Parse(RawProfile, "att.yaml", Kinds);
        await using var att = new ResilientInstrument("att", () => InstrumentAdapterFactory.Create("att", profile, host));
        await att.ConnectAsync(None).Bounded();

        var error = Assert.Throws<NotSupportedException>(() => att.GetCapability<IStepAttenuator>());

        Assert.Contains("IStepAttenuator", error.Message);
    }

    // The toy's raw dialect: "att N" sets, "att?" answers "att N".
    private sealed class AttenuatorDialect
    {
        private string _db = "0";

        public IReadOnlyList<string>? Handle(string line)
        {
            if (line == "att?")
            {
                return [$"att {_db}"];
            }

            if (line.StartsWith("att ", StringComparison.Ordinal))
            {
                _db = line[4..];
                return [];
            }

            return ["?"];
        }
    }
}
