using System.Numerics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Profiles;
using static BenchRunner.Instruments.Tests.Profiles.ProfileText;

namespace BenchRunner.Instruments.Tests.Profiles;

public class ReplyGrammarTests
{
    private static ReplyGrammar Grammar(params string[] dataLines) =>
        DriverProfile.Parse(WithData(dataLines), "p.yaml").NetworkAnalyser!.Data;

    private static ReplyGrammar PowerGrammar(params string[] dataLines) =>
        DriverProfile.Parse(Lines([
            "profile: s", "kinds: [spectrum-analyser]", "identity: {model: s}", "spectrum-analyser:",
            "  setup: span {start} {stop}", "  read: trace", "  default-points: 3", "  data:", .. dataLines.Select(l => "    " + l)]), "p.yaml")
            .SpectrumAnalyser!.Data;

    private static SweepReply Ok(ParseResult<SweepReply> result)
    {
        Assert.True(result.Success, result.Error);
        return result.Value;
    }

    private static void Near(Complex expected, Complex actual, double tolerance = 1e-5)
    {
        Assert.Equal(expected.Real, actual.Real, tolerance);
        Assert.Equal(expected.Imaginary, actual.Imaginary, tolerance);
    }

    [Fact]
    public void Parse_RealImaginaryPerLine_ReadsFrequencyAndSample()
    {
        var grammar = Grammar("columns: [freq-hz, re, im]");

        var reply = Ok(grammar.Parse(["136000000 0.25 -0.5", "137500000 1 0", "139000000 -1.5e-1 +2E-2"], 3));

        Assert.Equal(ValueForm.RealImaginary, grammar.Form);
        Assert.Equal([136e6, 137.5e6, 139e6], reply.FrequenciesHertz.ToArray());
        Assert.Equal([new Complex(0.25, -0.5), new Complex(1, 0), new Complex(-0.15, 0.02)], reply.Samples.ToArray());
        Assert.True(reply.LevelsDbm.IsEmpty);
    }

    [Fact]
    public void Parse_DecibelAngle_ConvertsAsTouchstoneDb()
    {
        var grammar = Grammar("columns: [db, deg]");

        var reply = Ok(grammar.Parse(["-3.0103 45", "-20 -90", "-6 180"], 3));

        Assert.Equal(ValueForm.DecibelAngle, grammar.Form);
        // REFERENCES: Touchstone 2.0 spec, DB format (20·log10|x|, angle in degrees): DB→RI vectors.
        Near(new Complex(0.5, 0.5), reply.Samples[0]);
        Near(new Complex(0, -0.1), reply.Samples[1]);
        Near(new Complex(-0.501187, 0), reply.Samples[2]);
        Assert.True(reply.FrequenciesHertz.IsEmpty);
    }

    [Fact]
    public void Parse_MagnitudeAngle_ConvertsAsTouchstoneMa()
    {
        var grammar = Grammar("columns: [freq-mhz, mag, deg]");

        var reply = Ok(grammar.Parse(["2.000 0.894 -12.136", "3 1 0"], 2));

        // REFERENCES: Touchstone spec-style line "# MHz S MA R 50 / 2.000 0.894 -12.136" → S11 = 0.87402 − j0.18795.
        Assert.Equal(ValueForm.MagnitudeAngle, grammar.Form);
        Assert.Equal(2e6, reply.FrequenciesHertz[0]);
        Near(new Complex(0.87402, -0.18795), reply.Samples[0]);
    }

    [Fact]
    public void Parse_NegativeLinearMagnitude_IsRefused()
    {
        var result = Grammar("columns: [mag, deg]").Parse(["-0.5 10", "0.5 10"], 2);

        Assert.False(result.Success);
        Assert.Contains("negative magnitude", result.Error);
    }

    [Fact]
    public void Parse_PowerOnOneLineWithScaleAndOffset_AppliesThemToEachValue()
    {
        var grammar = PowerGrammar("layout: one-line", "separator: comma", "columns: [{value: dbm, scale: 0.01, offset: -10}]");

        var reply = Ok(grammar.Parse(["-8712, -3000,-9000"], 3));

        Assert.Equal([-97.12, -40.0, -100.0], reply.LevelsDbm.Select(l => Math.Round(l, 9)));
        Assert.True(reply.Samples.IsEmpty);
    }

    [Fact]
    public void Parse_SemicolonsWithOneTrailingSeparator_AreAccepted()
    {
        var grammar = PowerGrammar("separator: semicolon", "columns: [freq-khz, dbm, skip]");

        var reply = Ok(grammar.Parse(["21400; -30.5; x;", "21410;-31;y"], 2));

        Assert.Equal([21.4e6, 21.41e6], reply.FrequenciesHertz.ToArray());
        Assert.Equal([-30.5, -31], reply.LevelsDbm.ToArray());
    }

    [Fact]
    public void Parse_HeaderIgnoredAndBlankLines_AreSkipped()
    {
        var grammar = Grammar("header-lines: 2", "ignore-lines: '^#'", "columns: [re, im]");

        var reply = Ok(grammar.Parse(["S21 data", "", "re im", "1 0", "# a comment", "", "0 1"], 2));

        Assert.Equal([new Complex(1, 0), new Complex(0, 1)], reply.Samples.ToArray());
    }

    [Fact]
    public void Parse_EndLine_EndsTheData()
    {
        var grammar = Grammar("columns: [re, im]", "end: line", "end-line: end");
        var parser = grammar.Begin(null);

        Assert.False(parser.Feed("1 0").Value);
        Assert.False(parser.Feed("0 1").Value);
        Assert.True(parser.Feed("end").Value);
        Assert.Equal(2, parser.Finish().Value.Count);
        Assert.False(parser.Feed("1 1").Success);
    }

    [Fact]
    public void Parse_EndLineMissing_IsAnError()
    {
        var result = Grammar("columns: [re, im]", "end-line: end").Parse(["1 0", "0 1"], null);

        Assert.False(result.Success);
        Assert.Contains("without its end line \"end\"", result.Error);
    }

    [Fact]
    public void Feed_CountedPoints_CompleteAtTheExpectedCount()
    {
        var grammar = Grammar("columns: [re, im]");
        Assert.Equal(ReplyEnd.PointCount, grammar.End);
        var parser = grammar.Begin(2);

        Assert.False(parser.Feed("1 0").Value);
        Assert.True(parser.Feed("0 1").Value);
        Assert.True(parser.IsComplete);
    }

    [Fact]
    public void Parse_WrongFieldCount_NamesTheLine()
    {
        var result = Grammar("columns: [freq-hz, re, im]").Parse(["1 0 0", "2 0"], 2);

        Assert.False(result.Success);
        Assert.Equal("line 2 \"2 0\" has 2 fields, expected 3", result.Error);
    }

    [Fact]
    public void Parse_FieldNotANumber_NamesFieldAndPoint()
    {
        var result = Grammar("columns: [re, im]").Parse(["1 0", "1 nan"], 2);

        Assert.False(result.Success);
        Assert.StartsWith("field \"nan\" of point 2 is not a number", result.Error);
    }

    [Fact]
    public void Parse_OneLineNotAWholeNumberOfPoints_IsAnError()
    {
        var result = Grammar("layout: one-line", "columns: [re, im]").Parse(["1 0 0.5"], null);

        Assert.False(result.Success);
        Assert.Contains("3 fields, which is not a whole number of points of 2 fields", result.Error);
    }

    [Fact]
    public void Parse_FewerPointsThanExpected_IsAnError()
    {
        var result = Grammar("columns: [re, im]", "end: line", "end-line: end").Parse(["1 0", "end"], 2);

        Assert.False(result.Success);
        Assert.Equal("the reply has 1 points, expected 2", result.Error);
    }

    [Fact]
    public void ToComplexTrace_FrequenciesWithinTolerance_GivesTheTraceOnTheExpectedAxis()
    {
        var grammar = Grammar("columns: [freq-mhz, re, im]", "frequency-tolerance: 1 kHz");
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 3);
        var reply = Ok(grammar.Parse(["136.0004 1 0", "137.4996 1 0", "139.001 1 0"], 3));

        var trace = grammar.ToComplexTrace(reply, axis, TraceQuantity.S21);

        Assert.True(trace.Success, trace.Error);
        Assert.Same(axis, trace.Value.Axis);
        Assert.Equal(TraceQuantity.S21, trace.Value.Quantity);
    }

    [Fact]
    public void ToComplexTrace_FrequencyOffTheAxis_IsAnError()
    {
        var grammar = Grammar("columns: [freq-mhz, re, im]", "frequency-tolerance: 1 kHz");
        var axis = FrequencyAxis.Linear(Frequency.FromMegahertz(136), Frequency.FromMegahertz(139), 3);
        var reply = Ok(grammar.Parse(["136 1 0", "137.6 1 0", "139 1 0"], 3));

        var trace = grammar.ToComplexTrace(reply, axis, TraceQuantity.S21);

        Assert.False(trace.Success);
        Assert.Equal("point 2 is at 137.6 MHz, expected 137.5 MHz within 1 kHz", trace.Error);
    }

    [Fact]
    public void ToPowerTrace_CountDifferentFromTheAxis_IsAnError()
    {
        var grammar = PowerGrammar("layout: one-line", "columns: [dbm]");
        var reply = Ok(grammar.Parse(["-1 -2"], null));

        var trace = grammar.ToPowerTrace(reply, FrequencyAxis.Linear(Frequency.FromMegahertz(1), Frequency.FromMegahertz(2), 3));

        Assert.False(trace.Success);
        Assert.Equal("the reply has 2 points, expected 3", trace.Error);
    }
}
