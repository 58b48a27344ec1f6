using System.Numerics;
using System.Text.RegularExpressions;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.TraceFiles;

/// <summary>
/// Reads one Touchstone file line by line (see <see cref="TouchstoneReader"/> for what is accepted).
/// One instance per file.
/// </summary>
internal sealed partial class TouchstoneParser
{
    private readonly string _source;
    private readonly int? _portsFromExtension;
    private readonly bool _requireVersion2;

    private readonly List<string> _comments = [];
    private readonly Dictionary<string, int> _keywordLines = [];
    private readonly List<double> _hertz = [];
    private readonly List<ComplexMatrix> _points = [];

    private int _line;
    private bool _seenContent;
    private int _version = 1;
    private Section _section = Section.Header;
    private TouchstoneOptionLine? _options;
    private int? _ports;
    private bool? _order12First;
    private MatrixFormat _matrixFormat = MatrixFormat.Full;
    private int? _declaredPoints;
    private List<double>? _references;
    private int _referencesLine;
    private Pending? _pending;

    public TouchstoneParser(string source, int? portsFromExtension, bool requireVersion2)
    {
        _source = source;
        _portsFromExtension = portsFromExtension;
        _requireVersion2 = requireVersion2;
    }

    private enum Section
    {
        Header,
        Information,
        NetworkData,
        NoiseData,
        Ended,
    }

    private enum MatrixFormat
    {
        Full,
        Lower,
        Upper,
    }

    private int PortCount => _ports ?? throw new InvalidOperationException("The port count is not known yet.");

    private int ValuesPerPoint => 1 + 2 * (_matrixFormat == MatrixFormat.Full ? PortCount * PortCount : PortCount * (PortCount + 1) / 2);

    private string PortsText => PortCount == 1 ? "1 port" : $"{PortCount} ports";

    private bool ReferencesPending => _references is not null && _references.Count < PortCount;

    /// <summary>Reads all lines and returns the data as S-parameters.</summary>
    /// <exception cref="InputFormatException">The text is not a valid Touchstone file.</exception>
    public TouchstoneData Parse(TextReader reader)
    {
        while (reader.ReadLine() is { } text)
        {
            _line++;
            ReadLine(text);
        }

        return Finish();
    }

    [GeneratedRegex(@"\s+")]
    private static partial Regex Whitespace();

    private static string Describe(double hertz) => Frequency.FromHertz(hertz).ToString();

    private SourceLocation At(int column) => new(_source, _line, column);

    private InputFormatException Error(int column, string detail) => new(At(column), detail);

    private void ReadLine(string text)
    {
        int bang = text.IndexOf('!');
        string content = bang >= 0 ? text[..bang] : text;
        if (string.IsNullOrWhiteSpace(content))
        {
            if (bang >= 0 && _section == Section.Header && _hertz.Count == 0)
            {
                _comments.Add(text[(bang + 1)..].Trim());
            }

            return;
        }

        int start = content.Length - content.TrimStart().Length;
        char first = content[start];

        switch (_section)
        {
            case Section.Ended:
                return; // Nothing after [End] belongs to the network.
            case Section.NoiseData:
                if (first == '[' && KeywordName(content, start).Name == "end")
                {
                    _section = Section.Ended;
                }

                return;
            case Section.Information:
                if (first == '[' && KeywordName(content, start).Name == "end information")
                {
                    _section = Section.Header;
                }

                return;
        }

        bool isFirst = !_seenContent;
        _seenContent = true;
        if (isFirst && first == '[' && KeywordName(content, start).Name == "version")
        {
            _version = 2;
        }
        else if (isFirst && _requireVersion2)
        {
            throw Error(start + 1, "expected \"[Version] 2.0\" as the first line of a .ts file");
        }

        if (first != '[' && ReferencesPending)
        {
            AddReferences(LineTokenizer.Split(content, start));
            return;
        }

        if (first == '[')
        {
            Keyword(content, start);
        }
        else if (first == '#')
        {
            // Only the first option line counts; later ones are ignored, as the specification says.
            _options ??= TouchstoneOptionLine.Parse(content, start, _source, _line);
        }
        else
        {
            DataLine(LineTokenizer.Split(content, start));
        }
    }

    private (string Name, string Display, int Close) KeywordName(string content, int open)
    {
        int close = content.IndexOf(']', open);
        if (close < 0)
        {
            throw Error(open + 1, "expected \"]\" to close the keyword");
        }

        var inner = Whitespace().Replace(content[(open + 1)..close].Trim(), " ");
        return (inner.ToLowerInvariant(), $"[{inner}]", close);
    }

    private void Keyword(string content, int open)
    {
        var (name, display, close) = KeywordName(content, open);
        var args = LineTokenizer.Split(content, close + 1);
        int column = open + 1;

        if (ReferencesPending)
        {
            throw new InputFormatException(SourceLocation.OfLine(_source, _referencesLine),
                $"expected {PortCount} reference resistances after [Reference], found {_references!.Count}");
        }

        if (_version == 1)
        {
            throw Error(column, name == "version"
                ? "[Version] must be the first line that is not a comment"
                : $"{display} is a version 2.0 keyword, but the file does not begin with \"[Version] 2.0\"");
        }

        if (_keywordLines.TryGetValue(name, out var firstLine))
        {
            throw Error(column, $"{display} is given twice (first on line {firstLine})");
        }

        _keywordLines[name] = _line;

        if (_section == Section.NetworkData && name is not ("noise data" or "end"))
        {
            throw Error(column, $"{display} must come before [Network Data]");
        }

        switch (name)
        {
            case "version":
                var version = Single(args, display, "a version number such as 2.0", close);
                if (version.Text is not ("2.0" or "2.1"))
                {
                    throw Error(version.Column, $"expected version 2.0 after [Version], found \"{version.Text}\"");
                }

                break;
            case "number of ports":
                _ports = PositiveInteger(args, display, close);
                if (_portsFromExtension is { } fromName && fromName != _ports)
                {
                    throw Error(args[0].Column, $"[Number of Ports] says {_ports}, but the file name says {fromName}");
                }

                break;
            case "two-port data order":
                var order = Single(args, display, "12_21 or 21_12", close);
                _order12First = order.Text switch
                {
                    "12_21" => true,
                    "21_12" => false,
                    _ => throw Error(order.Column, $"expected 12_21 or 21_12 after [Two-Port Data Order], found \"{order.Text}\""),
                };
                break;
            case "number of frequencies":
                _declaredPoints = PositiveInteger(args, display, close);
                break;
            case "number of noise frequencies":
                PositiveInteger(args, display, close); // Noise data are skipped; the count is only checked for form.
                break;
            case "reference":
                if (_ports is null)
                {
                    throw Error(column, "[Reference] must follow [Number of Ports]");
                }

                _references = [];
                _referencesLine = _line;
                AddReferences(args);
                break;
            case "matrix format":
                var format = Single(args, display, "Full, Lower or Upper", close);
                _matrixFormat = format.Text.ToLowerInvariant() switch
                {
                    "full" => MatrixFormat.Full,
                    "lower" => MatrixFormat.Lower,
                    "upper" => MatrixFormat.Upper,
                    _ => throw Error(format.Column, $"expected Full, Lower or Upper after [Matrix Format], found \"{format.Text}\""),
                };
                break;
            case "mixed-mode order":
                throw Error(column, "mixed-mode data ([Mixed-Mode Order]) are not supported");
            case "begin information":
                _section = Section.Information;
                break;
            case "network data":
                BeginNetworkData(column);
                break;
            case "noise data":
                if (_section != Section.NetworkData)
                {
                    throw Error(column, "[Noise Data] must follow [Network Data]");
                }

                EndOfNetworkData();
                _section = Section.NoiseData;
                break;
            case "end":
                if (_section != Section.NetworkData)
                {
                    throw Error(column, "expected [Network Data] before [End]");
                }

                EndOfNetworkData();
                _section = Section.Ended;
                break;
            default:
                throw Error(column, $"unknown keyword {display}");
        }
    }

    private TextToken Single(List<TextToken> args, string display, string expected, int close)
    {
        if (args.Count == 0)
        {
            throw Error(close + 2, $"expected {expected} after {display}");
        }

        if (args.Count > 1)
        {
            throw Error(args[1].Column, $"expected only {expected} after {display}, found also \"{args[1].Text}\"");
        }

        return args[0];
    }

    private int PositiveInteger(List<TextToken> args, string display, int close)
    {
        var token = Single(args, display, "a positive whole number", close);
        if (!int.TryParse(token.Text, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var n) || n < 1)
        {
            throw Error(token.Column, $"expected a positive whole number after {display}, found \"{token.Text}\"");
        }

        return n;
    }

    private void AddReferences(List<TextToken> tokens)
    {
        foreach (var token in tokens)
        {
            if (_references!.Count == PortCount)
            {
                throw Error(token.Column, $"expected {PortCount} reference resistances after [Reference], found more");
            }

            var value = TraceFileText.ParseNumber(token, _source, _line);
            if (value <= 0)
            {
                throw Error(token.Column, $"expected a positive reference resistance in ohms, found \"{token.Text}\"");
            }

            _references.Add(value);
        }
    }

    private void BeginNetworkData(int column)
    {
        if (_options is null)
        {
            throw Error(column, "expected the option line (for example \"# MHz S DB R 50\") before [Network Data]");
        }

        if (_ports is null)
        {
            throw Error(column, "expected [Number of Ports] before [Network Data]");
        }

        if (_declaredPoints is null)
        {
            throw Error(column, "expected [Number of Frequencies] before [Network Data]");
        }

        if (_ports == 2 && _order12First is null && _matrixFormat == MatrixFormat.Full)
        {
            throw Error(column, "expected [Two-Port Data Order] 12_21 or 21_12 before [Network Data] of a 2-port file");
        }

        if (_ports != 2 && _order12First is not null)
        {
            throw new InputFormatException(SourceLocation.OfLine(_source, _keywordLines["two-port data order"]),
                $"[Two-Port Data Order] is for 2-port files; this file has {PortsText}");
        }

        _section = Section.NetworkData;
    }

    private void DataLine(List<TextToken> tokens)
    {
        if (_version == 2 && _section != Section.NetworkData)
        {
            throw Error(tokens[0].Column, $"expected [Network Data] before the data, found \"{tokens[0].Text}\"");
        }

        if (_options is null)
        {
            throw Error(tokens[0].Column, "expected the option line (for example \"# MHz S DB R 50\") before the first data line");
        }

        if (_ports is null)
        {
            _ports = _portsFromExtension ?? InferPorts(tokens);
        }

        int index = 0;
        if (_pending is null)
        {
            var first = tokens[0];
            if (!TraceFileText.TryParseScaled(first.Text, _options.PowerOfTen, out var hertz))
            {
                throw Error(first.Column, $"expected a number, found \"{first.Text}\"");
            }

            // Version 1 two-port files may append noise parameters (5 values a line), which begin
            // at a frequency not above the last network frequency. They are skipped.
            if (_version == 1 && _ports == 2 && tokens.Count == 5 && _hertz.Count > 0 && hertz <= _hertz[^1])
            {
                _section = Section.NoiseData;
                return;
            }

            StartPoint(first, hertz);
            index = 1;
        }

        var pending = _pending!;
        int before = pending.Count;
        for (; index < tokens.Count; index++)
        {
            if (pending.Count == ValuesPerPoint)
            {
                throw TooMany(pending, before, tokens, index);
            }

            pending.Values.Add(TraceFileText.ParseNumber(tokens[index], _source, _line));
        }

        if (pending.Count == ValuesPerPoint)
        {
            CompletePoint(pending);
        }
        else if (pending.Values.Count % 2 != 0)
        {
            // A line break inside a complex pair: the point is short (or the file is not what its name says).
            throw pending.Line == _line
                ? Error(0, $"expected {ValuesPerPoint} values per point for {PortsText}, found {tokens.Count}")
                : ShortPoint(pending.Line, before);
        }
    }

    private InputFormatException TooMany(Pending pending, int before, List<TextToken> tokens, int index) =>
        pending.Line == _line
            ? Error(tokens[index].Column, $"expected {ValuesPerPoint} values per point for {PortsText}, found {tokens.Count}")
            : ShortPoint(pending.Line, before);

    private InputFormatException ShortPoint(int line, int found) =>
        new(SourceLocation.OfLine(_source, line), $"expected {ValuesPerPoint} values per point for {PortsText}, found {found}");

    private int InferPorts(List<TextToken> tokens)
    {
        return tokens.Count switch
        {
            3 => 1,
            9 => 2,
            _ => throw Error(0,
                $"cannot tell the number of ports: the first data line has {tokens.Count} values "
                + "(3 for one port, 9 for two); name the file .s1p or .s2p"),
        };
    }

    private void StartPoint(TextToken token, double hertz)
    {
        if (hertz < 0)
        {
            throw Error(token.Column, $"expected a frequency of 0 or more, found \"{token.Text}\"");
        }

        if (_hertz.Count > 0 && hertz <= _hertz[^1])
        {
            throw Error(token.Column, $"frequencies must be strictly increasing: {Describe(hertz)} follows {Describe(_hertz[^1])}");
        }

        if (_declaredPoints is { } declared && _hertz.Count >= declared)
        {
            throw Error(token.Column,
                $"more points than the {declared} that [Number of Frequencies] declares on line {_keywordLines["number of frequencies"]}");
        }

        _hertz.Add(hertz);
        _pending = new Pending(_line);
    }

    private void CompletePoint(Pending pending)
    {
        _pending = null;
        int n = PortCount;
        var pairs = new Complex[pending.Values.Count / 2];
        for (int k = 0; k < pairs.Length; k++)
        {
            pairs[k] = TouchstoneWords.Decode(_options!.Format, pending.Values[2 * k], pending.Values[2 * k + 1]);
        }

        var matrix = ComplexMatrix.Zero(n);
        int next = 0;
        if (_matrixFormat == MatrixFormat.Full)
        {
            bool columnsFirst = n == 2 && _order12First != true; // Version 1 and 21_12: N11 N21 N12 N22.
            for (int a = 0; a < n; a++)
            {
                for (int b = 0; b < n; b++)
                {
                    if (columnsFirst)
                    {
                        matrix[b, a] = pairs[next++];
                    }
                    else
                    {
                        matrix[a, b] = pairs[next++];
                    }
                }
            }
        }
        else
        {
            for (int row = 0; row < n; row++)
            {
                int from = _matrixFormat == MatrixFormat.Lower ? 0 : row;
                int to = _matrixFormat == MatrixFormat.Lower ? row : n - 1;
                for (int col = from; col <= to; col++)
                {
                    matrix[row, col] = pairs[next];
                    matrix[col, row] = pairs[next++];
                }
            }
        }

        _points.Add(ToScattering(matrix, pending.Line));
    }

    private ComplexMatrix ToScattering(ComplexMatrix matrix, int line)
    {
        var options = _options!;
        if (options.Parameter == TouchstoneParameter.S)
        {
            return matrix;
        }

        var references = References();
        ComplexMatrix? s;
        string singular;
        if (options.Parameter == TouchstoneParameter.Z)
        {
            // Version 1 Z data are normalised to R; version 2 data are in ohms.
            var z = _version == 1 ? matrix.Times(options.ReferenceOhms) : matrix;
            s = NetworkConversions.ImpedanceToScattering(z, references);
            singular = "Z + R";
        }
        else
        {
            var y = _version == 1 ? matrix.Times(1 / options.ReferenceOhms) : matrix;
            s = NetworkConversions.AdmittanceToScattering(y, references);
            singular = "U + R·Y";
        }

        return s ?? throw new InputFormatException(SourceLocation.OfLine(_source, line),
            $"the {options.Parameter}-parameters at {Describe(_hertz[_points.Count])} have no S-parameter equivalent ({singular} is singular)");
    }

    private IReadOnlyList<double> References() =>
        _references is { } given && given.Count == PortCount
            ? given
            : [.. Enumerable.Repeat(_options!.ReferenceOhms, PortCount)];

    private void EndOfNetworkData()
    {
        if (_pending is { } pending)
        {
            throw ShortPoint(pending.Line, pending.Count);
        }
    }

    private TouchstoneData Finish()
    {
        if (_pending is { } pending)
        {
            throw ShortPoint(pending.Line, pending.Count);
        }

        if (ReferencesPending)
        {
            throw new InputFormatException(SourceLocation.OfLine(_source, _referencesLine),
                $"expected {PortCount} reference resistances after [Reference], found {_references!.Count}");
        }

        var lastLine = SourceLocation.OfLine(_source, Math.Max(1, _line));
        if (_section == Section.Information)
        {
            throw new InputFormatException(lastLine, "expected [End Information] to close [Begin Information]");
        }

        if (_version == 2)
        {
            if (!_keywordLines.ContainsKey("network data"))
            {
                throw new InputFormatException(lastLine, "expected [Network Data] in a version 2.0 file");
            }

            if (_section != Section.Ended)
            {
                throw new InputFormatException(lastLine, "expected [End] at the end of a version 2.0 file");
            }

            if (_points.Count != _declaredPoints)
            {
                throw new InputFormatException(SourceLocation.OfLine(_source, _keywordLines["number of frequencies"]),
                    $"[Number of Frequencies] says {_declaredPoints}, but the file has {_points.Count} point{(_points.Count == 1 ? "" : "s")}");
            }
        }

        if (_points.Count == 0)
        {
            throw new InputFormatException(SourceLocation.OfFile(_source), "the file has no network data");
        }

        return new TouchstoneData(
            FrequencyAxis.FromHertz(_hertz),
            PortCount,
            _points.SelectMany(m => m.RowMajor()),
            References(),
            _version,
            _options!.Parameter,
            _comments);
    }

    private sealed class Pending(int line)
    {
        public int Line { get; } = line;

        public List<double> Values { get; } = [];

        /// <summary>Values so far, the frequency included.</summary>
        public int Count => 1 + Values.Count;
    }
}
