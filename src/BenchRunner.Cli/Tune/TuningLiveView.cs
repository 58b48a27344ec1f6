using BenchRunner.Cli.Output;
using BenchRunner.Execution.Tuning;

namespace BenchRunner.Cli.Tune;

/// <summary>
/// The tuning session on a terminal: after every sweep the screen is redrawn in place with the
/// sweep number and time, a table of the figures (value, change since the last sweep, target,
/// in or out), a <see cref="TracePlot"/> of the trace against its mask, and the settle state.
/// When the session settles the status line says so (and rings the bell when asked).
/// </summary>
public sealed class TuningLiveView : ITuningObserver
{
    private const string Home = "\u001b[H";
    private const string ClearScreen = "\u001b[2J";
    private const string ClearLine = "\u001b[K";
    private const string ClearBelow = "\u001b[J";

    /// <summary>The short caution at the foot of every frame.</summary>
    public const string Caution = "Caution: use an insulated trimming tool, keep within every input's maximum level, mind ESD.";

    private readonly TextWriter _writer;
    private readonly string _title;
    private readonly SettleOptions _rule;
    private readonly bool _colour;
    private readonly bool _bell;
    private readonly int _plotWidth;
    private readonly int _plotHeight;
    private bool _started;

    /// <summary>Creates the view.</summary>
    /// <param name="writer">The terminal.</param>
    /// <param name="title">What is being tuned, e.g. <c>psf-137-tune on virtual-bench</c>.</param>
    /// <param name="rule">The settle rule, to say what is still needed.</param>
    /// <param name="colour">Whether to colour in and out.</param>
    /// <param name="bell">Whether to ring the terminal bell when the session settles.</param>
    /// <param name="plotWidth">The plot's width in columns, at least 10; 64 by default.</param>
    /// <param name="plotHeight">The plot's height in rows, at least 4; 12 by default.</param>
    public TuningLiveView(TextWriter writer, string title, SettleOptions rule, bool colour, bool bell, int plotWidth = 64, int plotHeight = 12)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(plotWidth, 10);
        ArgumentOutOfRangeException.ThrowIfLessThan(plotHeight, 4);
        _plotWidth = plotWidth;
        _plotHeight = plotHeight;
        _writer = writer ?? throw new ArgumentNullException(nameof(writer));
        _title = title;
        _rule = rule ?? throw new ArgumentNullException(nameof(rule));
        _colour = colour;
        _bell = bell;
    }

    /// <inheritdoc/>
    public void OnPass(TuningPass pass)
    {
        ArgumentNullException.ThrowIfNull(pass);
        var frame = Frame(pass);
        _writer.Write(_started ? Home : ClearScreen + Home);
        _started = true;
        foreach (var line in frame)
        {
            _writer.Write(line);
            _writer.WriteLine(ClearLine);
        }

        _writer.Write(ClearBelow);
        if (pass.Settle.JustSettled && _bell)
        {
            _writer.Write('\a');
        }

        _writer.Flush();
    }

    /// <summary>How many lines a frame takes besides the plot's rows (with one line of failed checks).</summary>
    public const int LinesBesidesPlot = 17;

    /// <summary>The lines of one frame, without the cursor control.</summary>
    public IReadOnlyList<string> Frame(TuningPass pass)
    {
        ArgumentNullException.ThrowIfNull(pass);
        var lines = new List<string>
        {
            $"Tuning {_title}    sweep {pass.Sweep}    {TuningText.Clock(pass.Elapsed)}    (Ctrl+C ends the session and keeps every sweep)",
            "",
        };
        int labelWidth = Math.Max(6, pass.Figures.Select(f => f.Label.Length).DefaultIfEmpty(0).Max());
        lines.Add($"  {"figure".PadRight(labelWidth)}  {"now",-14}  {"change",-12}  {"target",-22}");
        foreach (var f in pass.Figures)
        {
            lines.Add($"  {f.Label.PadRight(labelWidth)}  {TuningText.Value(f),-14}  {TuningText.Change(f),-12}  {TuningText.Target(f),-22}  {TuningText.Inside(f, _colour)}");
        }

        lines.Add("");
        if (pass.Trace is { } trace)
        {
            lines.AddRange(TracePlot.Render(trace, pass.Mask, _plotWidth, _plotHeight, _colour));
            lines.Add($"          {TracePlot.TraceMark} trace   {TracePlot.UpperMark} upper limit   {TracePlot.LowerMark} lower limit   {TracePlot.FailMark} outside the mask");
        }
        else
        {
            lines.Add("  (no trace to plot in this sweep)");
        }

        lines.Add("");
        var status = TuningText.Settle(pass.Settle, _rule);
        lines.Add("  " + (pass.Settle.Settled ? Display.Colour(status, ConsoleColour.Green, _colour)
            : pass.Settle.Inside ? status : Display.Colour(status, ConsoleColour.Yellow, _colour)));
        if (pass.FailedChecks.Count > 0)
        {
            lines.Add($"  outside: {string.Join("; ", pass.FailedChecks)}");
        }

        lines.Add("");
        lines.Add($"  {Caution}");
        return lines;
    }
}
