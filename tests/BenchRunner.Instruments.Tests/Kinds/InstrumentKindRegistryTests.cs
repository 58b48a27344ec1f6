using BenchRunner.Core.Yaml;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Tests.Kinds.Attenuator;

namespace BenchRunner.Instruments.Tests.Kinds;

public sealed class InstrumentKindRegistryTests
{
    [Fact]
    public void BuiltIn_HasTheThreeKindsInOrderWithTheirWords()
    {
        var kinds = InstrumentKindRegistry.BuiltIn;

        Assert.Equal([InstrumentKind.NetworkAnalyser, InstrumentKind.SpectrumAnalyser, InstrumentKind.SignalGenerator], kinds.Kinds);
        Assert.Equal(["network-analyser", "spectrum-analyser", "signal-generator"], kinds.Words.Select(w => w.Word));
        Assert.Equal("network-analyser, spectrum-analyser or signal-generator", kinds.Choices);
    }

    [Fact]
    public void BuiltIn_DescribesEachKindsPorts()
    {
        Assert.Equal((true, true), (InstrumentKind.NetworkAnalyser.HasProtectedInput, InstrumentKind.NetworkAnalyser.HasOutput));
        Assert.Equal((true, false), (InstrumentKind.SpectrumAnalyser.HasProtectedInput, InstrumentKind.SpectrumAnalyser.HasOutput));
        Assert.Equal((false, true), (InstrumentKind.SignalGenerator.HasProtectedInput, InstrumentKind.SignalGenerator.HasOutput));
    }

    [Fact]
    public void Add_AKind_LeavesTheRegistryItWasCalledOnUnchanged()
    {
        var extended = InstrumentKindRegistry.BuiltIn.AddStepAttenuator();

        Assert.Equal(4, extended.Kinds.Count);
        Assert.Same(StepAttenuatorKind.Instance, extended.Kinds[^1]);
        Assert.Equal(3, InstrumentKindRegistry.BuiltIn.Kinds.Count);
        Assert.Null(InstrumentKindRegistry.BuiltIn.Find("step-attenuator"));
        Assert.False(InstrumentKindRegistry.BuiltIn.Contains(StepAttenuatorKind.Instance));
    }

    [Fact]
    public void Add_TheSameKindTwice_IsRefused()
    {
        var error = Assert.Throws<ArgumentException>(() => InstrumentKindRegistry.BuiltIn.AddStepAttenuator().AddStepAttenuator());

        Assert.Contains("\"step-attenuator\" is registered already", error.Message);
    }

    [Fact]
    public void Add_AKindNamedLikeAProfileKey_IsRefused()
    {
        var error = Assert.Throws<ArgumentException>(() => InstrumentKindRegistry.Empty.Add(new NamedOnly("identity")));

        Assert.Contains("key of the driver profile format", error.Message);
    }

    [Fact]
    public void Find_AnyLetterCaseAndByCapability_GiveTheSameInstance()
    {
        var kinds = InstrumentKindRegistry.BuiltIn.AddStepAttenuator();

        Assert.Same(InstrumentKind.SpectrumAnalyser, kinds.Find("Spectrum-Analyser"));
        Assert.Same(StepAttenuatorKind.Instance, kinds.ForCapability(typeof(IStepAttenuator)));
        Assert.Same(InstrumentKind.SignalGenerator, kinds.ForCapability(typeof(ISignalGenerator)));
        Assert.Null(kinds.ForCapability(typeof(IDisposable)));
    }

    [Fact]
    public void WordOf_UnknownWord_IsReportedWithTheRegisteredWords()
    {
        var problems = new YamlProblems("bench.yaml");
        var text = new YamlText(new Core.Diagnostics.SourceLocation("bench.yaml", 3, 11), "step-attenuator", isPlain: true);

        var kind = InstrumentKindRegistry.BuiltIn.WordOf(text, "kind", problems);

        Assert.Null(kind);
        var error = Assert.Throws<Core.Diagnostics.InputFormatException>(problems.ThrowIfAny);
        Assert.Equal("bench.yaml:3:11: unknown value \"step-attenuator\" for \"kind\"; expected one of network-analyser, spectrum-analyser, signal-generator", error.Message);
    }

    [Fact]
    public void Constructor_AWordWithCapitals_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => new NamedOnly("Power-Supply"));
    }

    // A kind that is only a word: enough for the registry's own checks, never built.
    private sealed class NamedOnly(string word) : InstrumentKind(word, word, typeof(IComparable), hasProtectedInput: false, hasOutput: false)
    {
        protected override object CreateResilient(Instruments.Resilience.ResilientInstrument owner) => throw new NotSupportedException();

        protected override object? ReadProfileSection(Instruments.Profiles.ProfileSectionReader reader) => throw new NotSupportedException();

        protected override object CreateProfileCapability(Instruments.Profiles.ProfileChannel channel, object section) => throw new NotSupportedException();

        protected override Instruments.Scpi.IScpiCommandSection DefaultScpiSection() => throw new NotSupportedException();

        protected override Instruments.Scpi.IScpiCommandSection ReadScpiSection(Instruments.Profiles.ScpiSectionReader reader) => throw new NotSupportedException();

        protected override object CreateScpiCapability(Instruments.Scpi.ScpiInstrument instrument, Instruments.Scpi.IScpiCommandSection section) => throw new NotSupportedException();
    }
}
