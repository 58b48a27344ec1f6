using System.Text.RegularExpressions;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// How a sweep's data comes back: layout, separator, columns, header and ignored lines, and
/// where the data ends (the profile's <c>data:</c> section, see <c>docs/profile-format.md</c>).
/// Built only by the profile reader, which has checked that the columns make one value form.
/// </summary>
public sealed class ReplyGrammar
{
    internal ReplyGrammar(ReplyLayout layout, FieldSeparator separator, IReadOnlyList<ReplyColumn> columns, ValueForm form,
        Frequency frequencyTolerance, int headerLines, Regex? ignoreLines, ReplyEnd end, string? endLine)
    {
        Layout = layout;
        Separator = separator;
        Columns = columns;
        Form = form;
        FrequencyTolerance = frequencyTolerance;
        HeaderLines = headerLines;
        IgnoreLines = ignoreLines;
        End = end;
        EndLine = endLine;
    }

    /// <summary>One line per point, or all points on one line.</summary>
    public ReplyLayout Layout { get; }

    /// <summary>What separates the fields.</summary>
    public FieldSeparator Separator { get; }

    /// <summary>The columns of one point, in order.</summary>
    public IReadOnlyList<ReplyColumn> Columns { get; }

    /// <summary>How the values are written, decided by the columns.</summary>
    public ValueForm Form { get; }

    /// <summary>How far a reported frequency may lie from the expected one; 1 Hz by default.</summary>
    public Frequency FrequencyTolerance { get; }

    /// <summary>How many non-blank lines at the start of the reply are a header and are skipped.</summary>
    public int HeaderLines { get; }

    /// <summary>Lines matching this pattern are skipped anywhere in the reply; null for none.</summary>
    public Regex? IgnoreLines { get; }

    /// <summary>How the end of the data is recognised.</summary>
    public ReplyEnd End { get; }

    /// <summary>The text of the line that ends the data, for <see cref="ReplyEnd.EndLine"/>.</summary>
    public string? EndLine { get; }

    /// <summary>True when one of the columns is the point's frequency.</summary>
    public bool HasFrequencyColumn => Columns.Any(c => c.IsFrequency);

    /// <summary>
    /// Reads the lines of a whole reply (without the prompt). Blank lines are skipped.
    /// </summary>
    /// <param name="lines">The reply's lines, as received.</param>
    /// <param name="expectedPoints">The points the sweep must have, when known; it also ends a <see cref="ReplyEnd.PointCount"/> reply.</param>
    /// <returns>The points, or what was wrong with the reply.</returns>
    public ParseResult<SweepReply> Parse(IReadOnlyList<string> lines, int? expectedPoints)
    {
        ArgumentNullException.ThrowIfNull(lines);
        var parser = Begin(expectedPoints);
        foreach (var line in lines)
        {
            var fed = parser.Feed(line);
            if (!fed.Success)
            {
                return ParseResult<SweepReply>.Fail(fed.Error);
            }
        }

        return parser.Finish();
    }

    /// <summary>
    /// Puts S-parameter points on <paramref name="axis"/>: the count must match, and reported
    /// frequencies must lie within <see cref="FrequencyTolerance"/> of the axis.
    /// </summary>
    public ParseResult<ComplexTrace> ToComplexTrace(SweepReply reply, FrequencyAxis axis, TraceQuantity quantity)
    {
        ArgumentNullException.ThrowIfNull(reply);
        ArgumentNullException.ThrowIfNull(axis);
        var check = CheckAxis(reply, axis);
        return check is null
            ? ParseResult<ComplexTrace>.Ok(new ComplexTrace(axis, quantity, reply.Samples))
            : ParseResult<ComplexTrace>.Fail(check);
    }

    /// <summary>Puts power points on <paramref name="axis"/>, with the same checks as <see cref="ToComplexTrace"/>.</summary>
    public ParseResult<PowerTrace> ToPowerTrace(SweepReply reply, FrequencyAxis axis)
    {
        ArgumentNullException.ThrowIfNull(reply);
        ArgumentNullException.ThrowIfNull(axis);
        var check = CheckAxis(reply, axis);
        return check is null
            ? ParseResult<PowerTrace>.Ok(new PowerTrace(axis, reply.LevelsDbm))
            : ParseResult<PowerTrace>.Fail(check);
    }

    internal SweepReplyParser Begin(int? expectedPoints) => new(this, expectedPoints);

    private string? CheckAxis(SweepReply reply, FrequencyAxis axis)
    {
        if (reply.Count != axis.Count)
        {
            return $"the reply has {reply.Count} points, expected {axis.Count}";
        }

        if (reply.FrequenciesHertz.IsEmpty)
        {
            return null;
        }

        for (int i = 0; i < axis.Count; i++)
        {
            var error = Math.Abs(reply.FrequenciesHertz[i] - axis.Hertz[i]);
            if (!(error <= FrequencyTolerance.Hertz))
            {
                return $"point {i + 1} is at {Describe(reply.FrequenciesHertz[i])}, expected {axis[i]} within {FrequencyTolerance}";
            }
        }

        return null;
    }

    private static string Describe(double hertz) =>
        double.IsFinite(hertz) && hertz >= 0 ? Frequency.FromHertz(hertz).ToString() : $"{hertz} Hz";

    internal static string Quote(string line) => $"\"{InstrumentException.Printable(line, 80)}\"";
}
