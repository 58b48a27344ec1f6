using System.Globalization;
using BenchRunner.Core.Text;
using BenchRunner.Execution.Tuning;

namespace BenchRunner.Cli.Tune;

/// <summary>
/// The tuning session without a terminal (a pipe, CI, a service): one plain line per sweep, e.g.
/// <c>sweep 12 +5.5s out center_hz=137.1821 MHz(+31.2 kHz,OUT) ... streak=0</c>, and a line
/// <c>settled at sweep N</c> when it settles. No colour, no cursor movement.
/// </summary>
public sealed class TuningLogView(TextWriter writer, SettleOptions rule, bool bell = false) : ITuningObserver
{
    /// <inheritdoc/>
    public void OnPass(TuningPass pass)
    {
        ArgumentNullException.ThrowIfNull(pass);
        writer.WriteLine(Line(pass));
        if (pass.Settle.JustSettled)
        {
            writer.WriteLine($"settled at sweep {pass.Sweep}: every target held for {Counted.Of(pass.Settle.Streak, "sweep")} ({pass.Settle.Held.TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture)} s; the rule asks {Counted.Of(rule.Sweeps, "sweep")} and {rule.MinimumTime.TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture)} s){(bell ? "\a" : "")}");
        }
        else if (pass.Settle.JustLeft)
        {
            writer.WriteLine($"left the target at sweep {pass.Sweep}: {string.Join(", ", pass.FailedChecks)}");
        }

        writer.Flush();
    }

    /// <summary>The one line for <paramref name="pass"/>.</summary>
    public static string Line(TuningPass pass)
    {
        ArgumentNullException.ThrowIfNull(pass);
        var cells = pass.Figures.Select(f =>
        {
            var detail = string.Join(",", new[] { TuningText.Change(f), TuningText.Inside(f, colour: false) }.Where(s => s.Length > 0));
            return $"{f.Key}={TuningText.Value(f)}{(detail.Length == 0 ? "" : $"({detail})")}";
        });
        var seconds = pass.Elapsed.TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture);
        var state = pass.Settle.Settled ? "settled" : pass.Settle.Inside ? "in" : "out";
        return $"sweep {pass.Sweep} +{seconds}s {state} {string.Join(" ", cells)} streak={pass.Settle.Streak}";
    }
}
