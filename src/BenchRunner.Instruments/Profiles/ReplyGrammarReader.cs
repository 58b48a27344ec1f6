using BenchRunner.Core.Quantities;
using BenchRunner.Core.Yaml;
using static BenchRunner.Instruments.Profiles.DriverProfileKeys;

namespace BenchRunner.Instruments.Profiles;

/// <summary>Reads a capability's <c>data:</c> section into a <see cref="ReplyGrammar"/>.</summary>
internal sealed class ReplyGrammarReader(ProfileReadContext context)
{
    private const string ComplexForms = "re and im, db and deg, or mag and deg";
    private readonly YamlProblems _problems = context.Problems;

    /// <summary>Reads the data section of <paramref name="section"/>; power grammars take a dbm column, the others S-parameters.</summary>
    public ReplyGrammar? Read(StrictMap section, bool power, int? defaultPoints)
    {
        var d = section.Mapping(Data, DataKeys, "describe how the data comes back, e.g. \"data: {columns: [freq-hz, re, im]}\"");
        if (d is null)
        {
            return null;
        }

        int before = _problems.Count;
        var layout = d.Word(Layout, Layouts) ?? ReplyLayout.PointPerLine;
        var separator = d.Word(Separator, Separators) ?? FieldSeparator.Whitespace;
        var columns = ReadColumns(d, power, out var form);
        bool hasFrequency = columns?.Any(c => c.IsFrequency) == true;
        var tolerance = d.FrequencyWithUnit(FrequencyTolerance) ?? Frequency.FromHertz(1);
        if (d.Has(FrequencyTolerance) && columns is not null && !hasFrequency)
        {
            _problems.Add(d.Key(FrequencyTolerance)!, $"\"{FrequencyTolerance}\" needs a frequency column (freq-hz, freq-khz, freq-mhz or freq-ghz) to check");
        }

        var headerLines = d.Integer(HeaderLines, 0, 1000) ?? 0;
        var ignore = d.Text(IgnoreLines) is { } ignoreText ? PatternReader.Read(ignoreText, IgnoreLines, null, _problems) : null;
        var end = ReadEnd(d, layout, power, defaultPoints, out var endLine);
        if (_problems.Count > before || columns is null || end is null)
        {
            return null;
        }

        return new ReplyGrammar(layout, separator, columns, form, tolerance, headerLines, ignore, end.Value, endLine);
    }

    private List<ReplyColumn>? ReadColumns(StrictMap d, bool power, out ValueForm form)
    {
        form = ValueForm.Power;
        var list = d.List(Columns, "columns such as [freq-hz, re, im]", "name the columns of a point, e.g. \"columns: [freq-hz, re, im]\"");
        if (list is null)
        {
            return null;
        }

        var columns = new List<ReplyColumn>();
        var seen = new Dictionary<ColumnKind, YamlItem>();
        bool ok = true;
        foreach (var item in list.Items)
        {
            var column = ReadColumn(item, d);
            if (column is null)
            {
                ok = false;
                continue;
            }

            if (column.Kind != ColumnKind.Skip)
            {
                var kind = column.IsFrequency ? ColumnKind.FrequencyHz : column.Kind;
                if (seen.ContainsKey(kind))
                {
                    _problems.Add(item, column.IsFrequency ? "a second frequency column; a point has one frequency" : $"\"{Word(column.Kind)}\" is given twice in \"{Columns}\"");
                    ok = false;
                    continue;
                }

                seen[kind] = item;
            }

            if (power ? column.Kind is ColumnKind.Real or ColumnKind.Imaginary or ColumnKind.Decibels or ColumnKind.Magnitude or ColumnKind.Degrees
                      : column.Kind is ColumnKind.Dbm)
            {
                _problems.Add(item, power
                    ? $"a spectrum analyser's data holds power; \"{Word(column.Kind)}\" is for S-parameters; expected dbm"
                    : $"a network analyser's data holds S-parameters; \"dbm\" is for a spectrum analyser's power; expected {ComplexForms}");
                ok = false;
                continue;
            }

            columns.Add(column);
        }

        if (!ok)
        {
            return null;
        }

        if (list.Items.Count == 0)
        {
            _problems.Add(list, $"\"{Columns}\" is empty; name the columns of a point, e.g. [freq-hz, re, im]");
            return null;
        }

        if (power)
        {
            if (!seen.ContainsKey(ColumnKind.Dbm))
            {
                _problems.Add(list, $"the columns hold no power; a spectrum analyser's data needs a dbm column");
                return null;
            }

            form = ValueForm.Power;
            return columns;
        }

        bool Has(ColumnKind k) => seen.ContainsKey(k);
        var forms = new List<(ValueForm Form, bool Complete, bool Partial)>
        {
            (ValueForm.RealImaginary, Has(ColumnKind.Real) && Has(ColumnKind.Imaginary), Has(ColumnKind.Real) || Has(ColumnKind.Imaginary)),
            (ValueForm.DecibelAngle, Has(ColumnKind.Decibels) && Has(ColumnKind.Degrees), Has(ColumnKind.Decibels)),
            (ValueForm.MagnitudeAngle, Has(ColumnKind.Magnitude) && Has(ColumnKind.Degrees), Has(ColumnKind.Magnitude)),
        };
        int partial = forms.Count(f => f.Partial);
        if (partial > 1 || (Has(ColumnKind.Real) || Has(ColumnKind.Imaginary)) && Has(ColumnKind.Degrees))
        {
            _problems.Add(list, $"the columns mix two ways of writing a value; expected one pair: {ComplexForms}");
            return null;
        }

        var complete = forms.Where(f => f.Complete).ToList();
        if (complete.Count != 1)
        {
            _problems.Add(list, $"the columns give no complete value; expected a pair: {ComplexForms}");
            return null;
        }

        form = complete[0].Form;
        return columns;
    }

    private ReplyColumn? ReadColumn(YamlItem item, StrictMap d)
    {
        var choices = string.Join(", ", ColumnWords.Select(w => w.Word));
        if (item is YamlText { IsNull: false } word)
        {
            return StrictMap.WordOf(word, Columns, ColumnWords, _problems) is { } kind ? new ReplyColumn(kind) : null;
        }

        if (item is not YamlMap)
        {
            _problems.Add(item is YamlText ? d.ValueLocation(Columns) : item.Location,
                $"expected a column ({choices}) or a mapping such as {{value: dbm, scale: 0.01}}; found {StrictMap.Describe(item)}");
            return null;
        }

        var c = StrictMap.Open(item, "a column", ColumnKeys, _problems);
        if (c is null)
        {
            return null;
        }

        var kindValue = c.Word(Value, ColumnWords, $"say what the column holds, one of {choices}");
        var scale = c.Number(Scale) ?? 1;
        if (scale == 0)
        {
            _problems.Add(c.ValueLocation(Scale), $"\"{Scale}\" must not be 0");
            return null;
        }

        var offset = c.Number(Offset) ?? 0;
        if (kindValue == ColumnKind.Skip && (c.Has(Scale) || c.Has(Offset)))
        {
            _problems.Add(item, "a skipped column takes no scale or offset");
            return null;
        }

        return kindValue is { } k ? new ReplyColumn(k, scale, offset) : null;
    }

    private ReplyEnd? ReadEnd(StrictMap d, ReplyLayout layout, bool power, int? defaultPoints, out string? endLine)
    {
        endLine = d.Text(EndLine)?.Value.Trim();
        var end = d.Word(End, Ends);
        if (d.Has(End) && end is null)
        {
            return null;
        }

        if (end is null)
        {
            end = endLine is not null ? ReplyEnd.EndLine
                : context.Prompt is not null ? ReplyEnd.Prompt
                : layout == ReplyLayout.PointPerLine ? ReplyEnd.PointCount
                : ReplyEnd.DataLine;
        }

        var at = d.Has(End) ? d.ValueLocation(End) : d.MissingAt;
        switch (end)
        {
            case ReplyEnd.Prompt when context.Prompt is null:
                _problems.Add(at, "\"end: prompt\" needs a prompt; set \"framing: prompt\", or end the data with \"points\" or \"line\"");
                return null;
            case ReplyEnd.PointCount when layout == ReplyLayout.OneLine:
                _problems.Add(at, "\"end: points\" counts one line per point, but \"layout: one-line\" puts every point on one line");
                return null;
            case ReplyEnd.PointCount when power && defaultPoints is null:
                _problems.Add(at, $"a spectrum analyser's data ending after its points needs \"{DefaultPoints}\" for settings that choose no point count");
                return null;
            case ReplyEnd.EndLine when endLine is null:
                _problems.Add(at, $"\"end: line\" needs \"{EndLine}\": the text of the line that ends the data, e.g. \"end-line: end\"");
                return null;
        }

        if (endLine is not null && end != ReplyEnd.EndLine)
        {
            _problems.Add(d.Key(EndLine)!, $"\"{EndLine}\" is used only with \"end: line\"");
            return null;
        }

        return end;
    }

    private static string Word(ColumnKind kind) => ColumnWords.First(w => w.Value == kind).Word;
}
