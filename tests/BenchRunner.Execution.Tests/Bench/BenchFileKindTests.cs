using BenchRunner.Core.Diagnostics;
using BenchRunner.Execution.Bench;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Tests.Kinds.Attenuator;

namespace BenchRunner.Execution.Tests.Bench;

// A bench naming a kind that only a registry given to the reader knows: the toy step attenuator of
// the Instruments tests (compiled into this project too).
public sealed class BenchFileKindTests
{
    private const string Source = "bench.yaml";
    private static readonly InstrumentKindRegistry Kinds = InstrumentKindRegistry.BuiltIn.AddStepAttenuator();

    private const string ScpiBench = """
        bench: b
        instruments:
          att:
            kind: step-attenuator
            adapter: scpi
            connection: tcp:192.0.2.10:5025
            limits:
              max-input-level: +27 dBm
        """;

    [Fact]
    public void Parse_ToyKindWithItsRegistry_IsRead()
    {
        var bench = BenchFile.Parse(ScpiBench, Source, ".", Kinds);

        var att = bench.Instruments["att"];
        Assert.Same(StepAttenuatorKind.Instance, att.Kind);
        Assert.Equal(AdapterKind.Scpi, att.Adapter);
        Assert.Equal(27, att.MaxInputLevel!.Value.Dbm);
        Assert.Same(Kinds, bench.Kinds);
    }

    [Fact]
    public void Parse_ToyKindWithTheBuiltInKinds_IsAnUnknownKindAtItsPlace()
    {
        var error = Assert.Throws<InputFormatException>(() => BenchFile.Parse(ScpiBench, Source, "."));

        var problem = Assert.Single(error.Problems);
        Assert.Equal(new SourceLocation(Source, 4, 11), problem.Location);
        Assert.Equal("unknown value \"step-attenuator\" for \"kind\"; expected one of network-analyser, spectrum-analyser, signal-generator", problem.Detail);
    }

    [Fact]
    public void Parse_ToyKindWithAnOutputLimit_IsRefusedAsTheKindHasNoOutput()
    {
        var text = ScpiBench.Replace("max-input-level", "max-output-level", StringComparison.Ordinal);

        var error = Assert.Throws<InputFormatException>(() => BenchFile.Parse(text, Source, ".", Kinds));

        Assert.Equal(
            "instrument \"att\" is a step-attenuator and has no output; declare \"max-input-level\" instead",
            Assert.Single(error.Problems).Detail);
    }

    [Fact]
    public void Load_RawProfileOfTheToyKind_IsReadWithTheBenchsRegistry()
    {
        using var folder = new TempDirectory();
        folder.Write("att.yaml", """
            profile: bench-att
            kinds: [step-attenuator]
            identity: {maker: workshop, model: step-att}
            limits: {max-input-level: 20 dBm}
            step-attenuator:
              set: att {attenuation:db}
              query: att?
              reply: '^att (?<db>\d+)$'
            """);
        var path = folder.Write("bench.yaml", """
            bench: b
            instruments:
              att:
                kind: step-attenuator
                adapter: profile
                profile: att.yaml
                connection: tcp:192.0.2.10:5025
                limits: {max-input-level: +27 dBm}
            """);

        var att = BenchFile.Load(path, Kinds).Instruments["att"];

        Assert.Equal(AdapterKind.Raw, att.Adapter);
        Assert.Equal([StepAttenuatorKind.Instance], att.Profile!.Kinds);
        Assert.NotNull(att.Profile.SectionOf<StepAttenuatorCommands>(StepAttenuatorKind.Instance));
        // The lower of the bench's and the profile's declarations holds.
        Assert.Equal(20, att.MaxInputLevel!.Value.Dbm);
    }

    // The built-in kinds keep their words and messages now that they come from their descriptors.
    [Theory]
    [InlineData("signal-generator", "max-input-level",
        "instrument \"x\" is a signal-generator and has no RF input to protect; declare \"max-output-level\" instead")]
    [InlineData("spectrum-analyser", "max-output-level",
        "instrument \"x\" is a spectrum-analyser and has no output; declare \"max-input-level\" instead")]
    public void Parse_LimitTheKindHasNoPortFor_KeepsItsMessage(string kind, string limit, string expected)
    {
        var text = $"bench: b\ninstruments:\n  x:\n    kind: {kind}\n    adapter: scpi\n    connection: tcp:192.0.2.10:5025\n    limits: {{{limit}: 0 dBm}}\n";

        var error = Assert.Throws<InputFormatException>(() => BenchFile.Parse(text, Source, "."));

        Assert.Equal(expected, Assert.Single(error.Problems).Detail);
    }

    [Fact]
    public void Parse_NetworkAnalyserWithBothLimits_IsValid()
    {
        var text = "bench: b\ninstruments:\n  vna:\n    kind: network-analyser\n    adapter: scpi\n    connection: tcp:192.0.2.10:5025\n" +
            "    limits: {max-input-level: +10 dBm, max-output-level: 0 dBm}\n";

        var vna = BenchFile.Parse(text, Source, ".").Instruments["vna"];

        Assert.Equal((10.0, 0.0), (vna.MaxInputLevel!.Value.Dbm, vna.MaxOutputLevel!.Value.Dbm));
    }

    [Theory]
    [InlineData("network-analyser", "profile", "profiles/bench-sa.yaml",
        "the profile \"bench-sa\" describes spectrum-analyser, not network-analyser as instrument \"x\" is declared")]
    [InlineData("spectrum-analyser", "scpi", "profiles/bench-sa.yaml",
        "the profile \"bench-sa\" is a raw profile, but instrument \"x\" uses \"adapter: scpi\"; use \"adapter: profile\" or a scpi profile")]
    [InlineData("spectrum-analyser", "profile", "profiles/bench-sa-scpi.yaml",
        "the profile \"bench-sa-scpi\" is a scpi profile, but instrument \"x\" uses \"adapter: profile\"; use \"adapter: scpi\" or a raw profile")]
    public void Parse_ProfileOfAnotherKindOrAdapter_KeepsItsMessage(string kind, string adapter, string profile, string expected)
    {
        var text = $"bench: b\ninstruments:\n  x:\n    kind: {kind}\n    adapter: {adapter}\n    profile: {profile}\n    connection: sim:sa\n";

        var error = Assert.Throws<InputFormatException>(() => BenchFile.Parse(text, Source, RepositoryFiles.Example("")));

        Assert.Equal(expected, Assert.Single(error.Problems).Detail);
    }

    [Fact]
    public void Parse_NoKind_SaysWhichKindsThereAre()
    {
        var text = "bench: b\ninstruments:\n  x:\n    adapter: scpi\n    connection: tcp:192.0.2.10:5025\n";

        var error = Assert.Throws<InputFormatException>(() => BenchFile.Parse(text, Source, "."));

        Assert.EndsWith("say what it is: network-analyser, spectrum-analyser or signal-generator", Assert.Single(error.Problems).Detail);
    }
}
