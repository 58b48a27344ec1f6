using System.Globalization;
using BenchRunner.Cli.Output;
using BenchRunner.Core.Figures;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Text;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Tuning;

namespace BenchRunner.Cli.Tune;

/// <summary>How the tuning views write a figure, its change, its target and the settle state.</summary>
public static class TuningText
{
    /// <summary>The figure's value in its unit, or <c>-</c> when it has none.</summary>
    public static string Value(TuningFigure figure) => figure.Value is not { } v ? "-" : Shown(figure, v);

    /// <summary>The change since the last sweep with its sign, e.g. <c>+31.2 kHz</c>, <c>-0.02 dB</c>; empty when unknown.</summary>
    public static string Change(TuningFigure figure)
    {
        if (figure.Change is not { } d)
        {
            return "";
        }

        // Shown at the resolution of the value itself: finer digits of a change are not in the value's text.
        if (figure.Value is { } value && QuantityFormat.Resolution(value, figure.Unit) is var step and > 0)
        {
            d = Math.Round(d / step) * step;
        }

        // A change of a level in dBm is a ratio, in dB.
        var unit = figure.Unit == QuantityUnit.DecibelMilliwatt ? QuantityUnit.Decibel : figure.Unit;
        var text = QuantityFormat.Format(Math.Abs(d), unit);
        // A change too small to show at this resolution has no direction.
        bool shown = text.Any(c => c is >= '1' and <= '9');
        return (!shown ? "±" : d > 0 ? "+" : "-") + text;
    }

    /// <summary>The target in words, e.g. <c>137.5 MHz ± 300 kHz</c>, <c>at most 4 dB</c>; <c>-</c> when the plan sets none.</summary>
    public static string Target(TuningFigure figure)
    {
        if (figure.Limit is not { } limit)
        {
            return "-";
        }

        string F(double v) => Shown(figure, v);
        return (limit.Min, limit.Max, limit.Target) switch
        {
            ({ } lo, { } hi, { } t) => $"{F(t)} ± {QuantityFormat.Format((hi - lo) / 2, limit.Unit)}",
            ({ } lo, { } hi, null) => $"{F(lo)} to {F(hi)}",
            ({ } lo, null, _) => $"at least {F(lo)}",
            (null, { } hi, _) => $"at most {F(hi)}",
            _ => "-",
        };
    }

    // A margin is shown with its sign (+0.6 dB), every other value as it is.
    private static string Shown(TuningFigure figure, double value) => figure.Key == FigureKeys.MaskMargin
        ? QuantityFormat.Signed(value, figure.Unit)
        : QuantityFormat.Format(value, figure.Unit);

    /// <summary><c>in</c>, <c>OUT</c>, or empty when the figure has no target; coloured when asked.</summary>
    public static string Inside(TuningFigure figure, bool colour) => figure.Inside switch
    {
        true => Display.Colour("in", ConsoleColour.Green, colour),
        false => Display.Colour("OUT", ConsoleColour.Red, colour),
        null => "",
    };

    /// <summary>The settle state in one sentence, e.g. <c>inside for 3 sweeps (2.0 s); settled after 5 sweeps and 3.0 s</c>.</summary>
    public static string Settle(SettleProgress progress, SettleOptions rule)
    {
        string Seconds(TimeSpan t) => $"{t.TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture)} s";
        string needs = $"{Counted.Of(rule.Sweeps, "sweep")} and {Seconds(rule.MinimumTime)}";
        if (progress.Settled)
        {
            return $"SETTLED: every target held for {Counted.Of(progress.Streak, "sweep")} ({Seconds(progress.Held)}); the rule is {needs}";
        }

        if (!progress.Inside)
        {
            return progress.JustLeft ? "left the target after settling; waiting for it to hold again" : $"not inside yet; settles after {needs} inside";
        }

        return $"inside for {Counted.Of(progress.Streak, "sweep")} ({Seconds(progress.Held)}); settles after {needs}";
    }

    /// <summary>A duration as minutes and seconds, e.g. <c>01:07.5</c>.</summary>
    public static string Clock(TimeSpan elapsed) =>
        $"{(int)elapsed.TotalMinutes:00}:{elapsed.Seconds:00}.{elapsed.Milliseconds / 100}";
}
