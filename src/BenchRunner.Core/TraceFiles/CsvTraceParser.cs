using System.Globalization;
using System.Numerics;
using System.Text.RegularExpressions;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.TraceFiles;

/// <summary>Reads one file of the layout described at <see cref="CsvTraceFile"/>. One instance per file.</summary>
internal sealed partial class CsvTraceParser
{
    private static readonly string ExpectedColumns =
        "s11_re, s11_im, s21_re, s21_im, s12_re, s12_im, s22_re, s22_im or " + CsvTraceFile.PowerColumn;

    private readonly string _source;
    private readonly Dictionary<string, int> _metadataLines = [];
    private readonly List<double> _hertz = [];
    private readonly List<Column> _columns = [];
    private readonly List<List<double>> _values = [];

    private int _line;
    private int _headerLine;
    private double _referenceOhms = 50;

    public CsvTraceParser(string source) => _source = source;

    private enum State
    {
        First,
        Metadata,
        Rows,
    }

    /// <summary>Reads all lines and builds the trace set.</summary>
    /// <exception cref="InputFormatException">The text does not follow the layout.</exception>
    public TraceSet Parse(TextReader reader)
    {
        var state = State.First;
        while (reader.ReadLine() is { } text)
        {
            _line++;
            if (string.IsNullOrWhiteSpace(text))
            {
                continue;
            }

            switch (state)
            {
                case State.First:
                    if (Signature(text))
                    {
                        state = State.Metadata;
                    }
                    else
                    {
                        Header(text, minimal: true);
                        state = State.Rows;
                    }

                    break;
                case State.Metadata:
                    if (text.TrimStart().StartsWith('#'))
                    {
                        Metadata(text);
                    }
                    else
                    {
                        Header(text, minimal: false);
                        state = State.Rows;
                    }

                    break;
                default:
                    if (text.TrimStart().StartsWith('#'))
                    {
                        if (MetadataLine().IsMatch(text))
                        {
                            throw new InputFormatException(SourceLocation.OfLine(_source, _line),
                                $"metadata must come before the header row on line {_headerLine}");
                        }

                        continue; // A comment between rows.
                    }

                    Row(text);
                    break;
            }
        }

        if (state != State.Rows)
        {
            throw new InputFormatException(SourceLocation.OfLine(_source, Math.Max(1, _line)),
                $"expected a header row such as \"{CsvTraceFile.FrequencyColumn},s21_re,s21_im\"");
        }

        if (_hertz.Count == 0)
        {
            throw new InputFormatException(SourceLocation.OfLine(_source, _headerLine), "the file has no data rows after the header");
        }

        return Build();
    }

    [GeneratedRegex(@"^\s*#\s*(?<key>[A-Za-z][A-Za-z0-9_]*)\s*=\s*(?<value>.*?)\s*$")]
    private static partial Regex MetadataLine();

    [GeneratedRegex(@"^\s*#\s*(?<word>\S+)\s+(?<version>\S+)\s*$")]
    private static partial Regex SignatureLine();

    private SourceLocation At(int column) => new(_source, _line, column);

    private bool Signature(string text)
    {
        var match = SignatureLine().Match(text);
        if (!match.Success || !match.Groups["word"].Value.Equals(CsvTraceFile.Signature, StringComparison.OrdinalIgnoreCase))
        {
            if (text.TrimStart().StartsWith('#'))
            {
                throw new InputFormatException(At(1),
                    $"expected the first line \"# {CsvTraceFile.Signature} {CsvTraceFile.FormatVersion}\"");
            }

            return false;
        }

        var version = match.Groups["version"];
        if (version.Value != CsvTraceFile.FormatVersion.ToString(CultureInfo.InvariantCulture))
        {
            throw new InputFormatException(At(version.Index + 1),
                $"layout version \"{version.Value}\" is not supported; this reader knows version {CsvTraceFile.FormatVersion}");
        }

        return true;
    }

    private void Metadata(string text)
    {
        var match = MetadataLine().Match(text);
        if (!match.Success)
        {
            return; // A free comment.
        }

        var key = match.Groups["key"].Value.ToLowerInvariant();
        if (_metadataLines.TryGetValue(key, out var first))
        {
            throw new InputFormatException(At(match.Groups["key"].Index + 1), $"\"{key}\" is given twice (first on line {first})");
        }

        _metadataLines[key] = _line;
        if (key == CsvTraceFile.ReferenceKey)
        {
            var value = match.Groups["value"];
            if (!TraceFileText.TryParseNumber(value.Value, out var ohms) || ohms <= 0)
            {
                throw new InputFormatException(At(value.Index + 1),
                    $"expected a positive reference impedance in ohms, found \"{value.Value}\"");
            }

            _referenceOhms = ohms;
        }

        // Other keys are kept for people and later versions; this reader ignores them.
    }

    private void Header(string text, bool minimal)
    {
        _headerLine = _line;
        var fields = Split(text);
        var names = fields.Select(f => f.Text.ToLowerInvariant()).ToList();

        if (minimal)
        {
            if (names is not [CsvTraceFile.FrequencyColumn, CsvTraceFile.PowerColumn])
            {
                throw new InputFormatException(At(1),
                    $"expected the first line \"# {CsvTraceFile.Signature} {CsvTraceFile.FormatVersion}\" "
                    + $"(only a two-column \"{CsvTraceFile.FrequencyColumn},{CsvTraceFile.PowerColumn}\" file may leave it out)");
            }
        }

        if (names[0] != CsvTraceFile.FrequencyColumn)
        {
            throw new InputFormatException(At(fields[0].Column),
                $"expected \"{CsvTraceFile.FrequencyColumn}\" as the first column, found \"{fields[0].Text}\"");
        }

        if (fields.Count == 1)
        {
            throw new InputFormatException(At(fields[0].Column + fields[0].Text.Length),
                $"expected at least one trace column after \"{CsvTraceFile.FrequencyColumn}\"");
        }

        var seen = new Dictionary<TraceQuantity, int>();
        for (int i = 1; i < fields.Count; i++)
        {
            var field = fields[i];
            var quantity = QuantityOf(names[i], out var part);
            if (quantity is null)
            {
                throw new InputFormatException(At(field.Column), $"unknown column \"{field.Text}\"; expected {ExpectedColumns}");
            }

            if (seen.TryGetValue(quantity.Value, out var firstColumn))
            {
                throw new InputFormatException(At(field.Column),
                    $"column \"{field.Text}\" repeats {quantity} (first at column {firstColumn})");
            }

            if (part == "im")
            {
                throw new InputFormatException(At(field.Column), $"expected \"{names[i][..^2]}re\" before \"{field.Text}\"");
            }

            seen[quantity.Value] = field.Column;
            if (part == "re")
            {
                var partner = $"{names[i][..^2]}im";
                if (i + 1 >= fields.Count || names[i + 1] != partner)
                {
                    int column = i + 1 < fields.Count ? fields[i + 1].Column : field.Column + field.Text.Length;
                    var found = i + 1 < fields.Count ? $"\"{fields[i + 1].Text}\"" : "the end of the line";
                    throw new InputFormatException(At(column), $"expected \"{partner}\" after \"{field.Text}\", found {found}");
                }

                i++;
            }

            _columns.Add(new Column(quantity.Value, part == "re"));
            _values.Add([]);
        }
    }

    private static TraceQuantity? QuantityOf(string name, out string part)
    {
        part = "";
        if (name == CsvTraceFile.PowerColumn)
        {
            return TraceQuantity.Power;
        }

        foreach (var q in (TraceQuantity[])[TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22])
        {
            var names = CsvTraceFile.ColumnNames(q);
            if (name == names[0])
            {
                part = "re";
                return q;
            }

            if (name == names[1])
            {
                part = "im";
                return q;
            }
        }

        return null;
    }

    private void Row(string text)
    {
        var fields = Split(text);
        int expected = 1 + _columns.Sum(c => c.Complex ? 2 : 1);
        if (fields.Count != expected)
        {
            var where = fields.Count > expected ? At(fields[expected].Column) : SourceLocation.OfLine(_source, _line);
            throw new InputFormatException(where,
                $"expected {expected} fields as in the header on line {_headerLine}, found {fields.Count}");
        }

        var frequencyField = fields[0];
        var hertz = TraceFileText.ParseNumber(frequencyField, _source, _line);
        if (hertz < 0)
        {
            throw new InputFormatException(At(frequencyField.Column), $"expected a frequency of 0 Hz or more, found \"{frequencyField.Text}\"");
        }

        if (_hertz.Count > 0 && hertz <= _hertz[^1])
        {
            throw new InputFormatException(At(frequencyField.Column),
                $"frequencies must be strictly increasing: {Frequency.FromHertz(hertz)} follows {Frequency.FromHertz(_hertz[^1])}");
        }

        int next = 1;
        foreach (var values in _values.Zip(_columns))
        {
            values.First.Add(TraceFileText.ParseNumber(fields[next++], _source, _line));
            if (values.Second.Complex)
            {
                values.First.Add(TraceFileText.ParseNumber(fields[next++], _source, _line));
            }
        }

        _hertz.Add(hertz);
    }

    private TraceSet Build()
    {
        var axis = FrequencyAxis.FromHertz(_hertz);
        var traces = new List<Trace>();
        for (int c = 0; c < _columns.Count; c++)
        {
            var values = _values[c];
            traces.Add(_columns[c].Complex
                ? new ComplexTrace(axis, _columns[c].Quantity, Enumerable.Range(0, axis.Count).Select(p => new Complex(values[2 * p], values[2 * p + 1])))
                : new PowerTrace(axis, values));
        }

        return new TraceSet(axis, traces, _referenceOhms);
    }

    /// <summary>Splits at commas; each field is trimmed and keeps the column of its first character.</summary>
    private static List<TextToken> Split(string text)
    {
        var fields = new List<TextToken>();
        int start = 0;
        while (true)
        {
            int comma = text.IndexOf(',', start);
            int end = comma < 0 ? text.Length : comma;
            var raw = text[start..end];
            int lead = raw.Length - raw.TrimStart().Length;
            fields.Add(new TextToken(raw.Trim(), start + lead + 1));
            if (comma < 0)
            {
                return fields;
            }

            start = comma + 1;
        }
    }

    private sealed record Column(TraceQuantity Quantity, bool Complex);
}
