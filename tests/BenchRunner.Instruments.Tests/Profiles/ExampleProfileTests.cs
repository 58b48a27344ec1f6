using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Instruments.Tests.Profiles;

public class ExampleProfileTests
{
    [Fact]
    public void Load_BenchVna_ReadsEveryPart()
    {
        var p = ExampleProfiles.Vna;

        Assert.Equal("bench-vna", p.Name);
        Assert.Equal("raw", p.Adapter);
        Assert.Equal([InstrumentKind.NetworkAnalyser], p.Kinds);
        Assert.Equal("br-vna> ", p.Framing.Prompt);
        Assert.True(p.Framing.Echo);
        Assert.Equal("\n", p.Framing.WriteTerminator);
        Assert.Equal(1048576, p.Framing.MaxMessageBytes);
        Assert.Equal(TimeSpan.FromSeconds(20), p.Timing.SweepTimeout);
        Assert.Equal(TimeSpan.FromMilliseconds(10), p.Timing.SettleAfterSetting);
        Assert.Equal(Frequency.FromMegahertz(1), p.Limits.FrequencyRange!.Value.Start);
        Assert.Equal(Frequency.FromGigahertz(1.5), p.Limits.FrequencyRange!.Value.Stop);
        Assert.Equal(Level.FromDbm(10), p.Limits.MaxInputLevel);
        Assert.Null(p.SpectrumAnalyser);
        Assert.Null(p.SignalGenerator);

        var na = p.NetworkAnalyser!;
        Assert.Equal("band {start:hz} {stop:hz} {points}", Assert.Single(na.Setup).Text);
        Assert.Equal([TraceQuantity.S11, TraceQuantity.S21], na.Read.Keys.Order());
        Assert.Equal(ValueForm.RealImaginary, na.Data.Form);
        Assert.Equal(ReplyEnd.Prompt, na.Data.End);
        Assert.Equal(1, na.Data.HeaderLines);
        Assert.True(na.Data.HasFrequencyColumn);
    }

    [Fact]
    public void Load_BenchSa_ReadsAScaledOneLineTrace()
    {
        var p = ExampleProfiles.Sa;

        Assert.Equal([InstrumentKind.SpectrumAnalyser], p.Kinds);
        Assert.False(p.Framing.Echo);
        var sa = p.SpectrumAnalyser!;
        Assert.Equal(5, sa.Setup.Count);
        Assert.Equal(401, sa.DefaultPoints);
        Assert.Equal(ReplyLayout.OneLine, sa.Data.Layout);
        Assert.Equal(FieldSeparator.Comma, sa.Data.Separator);
        Assert.Equal(ValueForm.Power, sa.Data.Form);
        Assert.Equal(0.01, Assert.Single(sa.Data.Columns).Scale);
        Assert.Equal(TimeSpan.FromMilliseconds(20), p.Timing.SettleBeforeRead);
    }

    [Fact]
    public void Load_BenchGen_ReadsAcknowledgedSettings()
    {
        var p = ExampleProfiles.Gen;

        Assert.Equal([InstrumentKind.SignalGenerator], p.Kinds);
        Assert.Null(p.Framing.Prompt);
        Assert.Equal("\r", p.Framing.WriteTerminator);
        Assert.Equal("ok", p.Acknowledgement);
        Assert.Equal(Level.FromDbm(-80), p.Limits.MinOutputLevel);
        Assert.Equal(Level.FromDbm(0), p.Limits.MaxOutputLevel);
        Assert.Equal("rf off", Assert.Single(p.OnConnect).Render(new TemplateArguments()));
        Assert.Equal("tone 137.5", p.SignalGenerator!.Frequency.Render(new TemplateArguments().Set("frequency", Frequency.FromMegahertz(137.5))));
    }

    [Fact]
    public void Identity_ExamplePattern_ExtractsTheFourFields()
    {
        var identity = ExampleProfiles.Vna.Identity!.FromReply(["benchrunner/sim-vna sn SIM-VNA-0001 fw 1.0"]);

        Assert.True(identity.Success, identity.Error);
        Assert.Equal(new("benchrunner", "sim-vna", "SIM-VNA-0001", "1.0"), identity.Value);
    }
}
