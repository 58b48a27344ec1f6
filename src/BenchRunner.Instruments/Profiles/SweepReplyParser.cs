using System.Collections.Immutable;
using System.Globalization;
using System.Numerics;
using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// Reads a sweep reply line by line, so that a device without a prompt can be read until its
/// data ends (<see cref="IsComplete"/>). Not reusable: one parser per reply.
/// </summary>
internal sealed class SweepReplyParser
{
    private readonly ReplyGrammar _grammar;
    private readonly int? _expectedPoints;
    private readonly ImmutableArray<double>.Builder _frequencies = ImmutableArray.CreateBuilder<double>();
    private readonly ImmutableArray<Complex>.Builder _samples = ImmutableArray.CreateBuilder<Complex>();
    private readonly ImmutableArray<double>.Builder _levels = ImmutableArray.CreateBuilder<double>();
    private readonly double[] _values;
    private int _headerLeft;
    private int _lineNumber;
    private bool _sawDataLine;

    public SweepReplyParser(ReplyGrammar grammar, int? expectedPoints)
    {
        _grammar = grammar;
        _expectedPoints = expectedPoints;
        _headerLeft = grammar.HeaderLines;
        _values = new double[grammar.Columns.Count];
    }

    /// <summary>True once the end of the data has been read (never for <see cref="ReplyEnd.Prompt"/>).</summary>
    public bool IsComplete { get; private set; }

    private int Count => _grammar.Form == ValueForm.Power ? _levels.Count : _samples.Count;

    /// <summary>Reads one line of the reply.</summary>
    public ParseResult<bool> Feed(string line)
    {
        _lineNumber++;
        var trimmed = line.Trim();
        if (trimmed.Length == 0)
        {
            return ParseResult<bool>.Ok(IsComplete);
        }

        if (IsComplete)
        {
            return Fail($"line {_lineNumber} {ReplyGrammar.Quote(line)} comes after the end of the data");
        }

        if (_headerLeft > 0)
        {
            _headerLeft--;
            return ParseResult<bool>.Ok(false);
        }

        if (_grammar.IgnoreLines?.IsMatch(line) == true)
        {
            return ParseResult<bool>.Ok(false);
        }

        if (_grammar.End == ReplyEnd.EndLine && trimmed == _grammar.EndLine)
        {
            IsComplete = true;
            return ParseResult<bool>.Ok(true);
        }

        if (_grammar.Layout == ReplyLayout.OneLine && _sawDataLine)
        {
            return Fail($"line {_lineNumber} {ReplyGrammar.Quote(line)} is a second data line; this profile expects all points on one line");
        }

        var fields = Split(trimmed);
        int perPoint = _grammar.Columns.Count;
        if (_grammar.Layout == ReplyLayout.PointPerLine ? fields.Count != perPoint : fields.Count % perPoint != 0 || fields.Count == 0)
        {
            return Fail(_grammar.Layout == ReplyLayout.PointPerLine
                ? $"line {_lineNumber} {ReplyGrammar.Quote(line)} has {fields.Count} field{(fields.Count == 1 ? "" : "s")}, expected {perPoint}"
                : $"the data line has {fields.Count} fields, which is not a whole number of points of {perPoint} field{(perPoint == 1 ? "" : "s")}");
        }

        _sawDataLine = true;
        for (int start = 0; start < fields.Count; start += perPoint)
        {
            var point = ReadPoint(fields, start, line);
            if (point is not null)
            {
                return Fail(point);
            }
        }

        if ((_grammar.End == ReplyEnd.PointCount && Count == _expectedPoints) || _grammar.End == ReplyEnd.DataLine)
        {
            IsComplete = true;
        }

        return ParseResult<bool>.Ok(IsComplete);
    }

    /// <summary>Ends the reply and returns its points, or what is missing.</summary>
    public ParseResult<SweepReply> Finish()
    {
        if (_grammar.End == ReplyEnd.EndLine && !IsComplete)
        {
            return ParseResult<SweepReply>.Fail($"the data ended without its end line \"{_grammar.EndLine}\"");
        }

        if (Count == 0)
        {
            return ParseResult<SweepReply>.Fail("the reply holds no data points");
        }

        if (_expectedPoints is { } expected && Count != expected)
        {
            return ParseResult<SweepReply>.Fail($"the reply has {Count} points, expected {expected}");
        }

        return ParseResult<SweepReply>.Ok(new SweepReply(
            _grammar.HasFrequencyColumn ? _frequencies.ToImmutable() : [],
            _grammar.Form == ValueForm.Power ? [] : _samples.ToImmutable(),
            _grammar.Form == ValueForm.Power ? _levels.ToImmutable() : []));
    }

    private string? ReadPoint(IReadOnlyList<string> fields, int start, string line)
    {
        double real = 0, imaginary = 0, decibels = 0, magnitude = 0, degrees = 0, dbm = 0;
        for (int c = 0; c < _grammar.Columns.Count; c++)
        {
            var column = _grammar.Columns[c];
            if (column.Kind == ColumnKind.Skip)
            {
                continue;
            }

            var field = fields[start + c];
            if (!double.TryParse(field, NumberStyles.Float, CultureInfo.InvariantCulture, out var number) || !double.IsFinite(number))
            {
                int point = Count + 1;
                return $"field {ReplyGrammar.Quote(field)} of point {point} is not a number (line {_lineNumber} {ReplyGrammar.Quote(line)})";
            }

            var value = number * column.Scale + column.Offset;
            switch (column.Kind)
            {
                case ColumnKind.FrequencyHz or ColumnKind.FrequencyKhz or ColumnKind.FrequencyMhz or ColumnKind.FrequencyGhz:
                    _frequencies.Add(value * column.HertzPerUnit);
                    break;
                case ColumnKind.Real: real = value; break;
                case ColumnKind.Imaginary: imaginary = value; break;
                case ColumnKind.Decibels: decibels = value; break;
                case ColumnKind.Magnitude: magnitude = value; break;
                case ColumnKind.Degrees: degrees = value; break;
                case ColumnKind.Dbm: dbm = value; break;
            }
        }

        switch (_grammar.Form)
        {
            case ValueForm.RealImaginary:
                _samples.Add(new Complex(real, imaginary));
                break;
            case ValueForm.DecibelAngle:
                // Touchstone's DB format: 20·log10|S| and the angle in degrees.
                _samples.Add(Complex.FromPolarCoordinates(Math.Pow(10, decibels / 20), degrees * Math.PI / 180));
                break;
            case ValueForm.MagnitudeAngle:
                if (magnitude < 0)
                {
                    return $"point {Count + 1} has a negative magnitude {magnitude} (line {_lineNumber} {ReplyGrammar.Quote(line)})";
                }

                _samples.Add(Complex.FromPolarCoordinates(magnitude, degrees * Math.PI / 180));
                break;
            default:
                _levels.Add(dbm);
                break;
        }

        return null;
    }

    private List<string> Split(string line)
    {
        if (_grammar.Separator == FieldSeparator.Whitespace)
        {
            return [.. line.Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries)];
        }

        var separator = _grammar.Separator == FieldSeparator.Comma ? ',' : ';';
        var fields = line.Split(separator).Select(f => f.Trim()).ToList();
        // Many devices end a list with one separator too many; one is tolerated.
        if (fields.Count > 1 && fields[^1].Length == 0)
        {
            fields.RemoveAt(fields.Count - 1);
        }

        return fields;
    }

    private static ParseResult<bool> Fail(string error) => ParseResult<bool>.Fail(error);
}
