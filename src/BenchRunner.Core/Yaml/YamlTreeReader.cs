using BenchRunner.Core.Diagnostics;
using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace BenchRunner.Core.Yaml;

/// <summary>
/// Reads YAML text into a tree of <see cref="YamlItem"/>s with locations, using YamlDotNet's
/// low-level parser. Strict where YAML itself is lenient: one document only, no aliases, no
/// duplicate keys, keys must be scalars. Every problem is an <see cref="InputFormatException"/>.
/// </summary>
public sealed class YamlTreeReader
{
    // Deeper than any sensible file; keeps hostile nesting from exhausting the stack.
    private const int MaxDepth = 64;

    private readonly IParser _parser;
    private readonly string _source;

    private YamlTreeReader(string text, string source)
    {
        _parser = new Parser(new StringReader(text));
        _source = source;
    }

    /// <summary>Parses <paramref name="text"/>; null when it holds no document (empty or only comments).</summary>
    /// <exception cref="InputFormatException">Not valid YAML, or outside the subset accepted.</exception>
    public static YamlItem? Read(string text, string source)
    {
        var reader = new YamlTreeReader(text, source);
        try
        {
            return reader.ReadStream();
        }
        catch (YamlException e)
        {
            throw new InputFormatException(reader.At(e.Start), $"not valid YAML: {e.Message.TrimEnd('.')}", e);
        }
    }

    private YamlItem? ReadStream()
    {
        Expect<StreamStart>();
        if (_parser.TryConsume<StreamEnd>(out _))
        {
            return null;
        }

        Expect<DocumentStart>();
        var root = ReadNode(0);
        Expect<DocumentEnd>();
        if (_parser.Accept<DocumentStart>(out var second))
        {
            throw new InputFormatException(At(second), "a second YAML document starts here; a file holds one document");
        }

        Expect<StreamEnd>();
        return root;
    }

    private YamlItem ReadNode(int depth)
    {
        var current = _parser.Current ?? throw new InvalidOperationException("The parser ended inside a document.");
        if (depth > MaxDepth)
        {
            throw new InputFormatException(At(current), $"nested more than {MaxDepth} levels deep");
        }

        switch (current)
        {
            case Scalar scalar:
                _parser.MoveNext();
                return new YamlText(At(scalar), scalar.Value, scalar.Style == ScalarStyle.Plain);

            case SequenceStart start:
                _parser.MoveNext();
                var items = new List<YamlItem>();
                while (!_parser.TryConsume<SequenceEnd>(out _))
                {
                    items.Add(ReadNode(depth + 1));
                }

                return new YamlList(At(start), items);

            case MappingStart start:
                _parser.MoveNext();
                return new YamlMap(At(start), ReadEntries(depth));

            case AnchorAlias alias:
                throw new InputFormatException(At(alias), $"aliases (*{alias.Value}) are not accepted; write the value out");

            default:
                throw new InputFormatException(At(current), "unexpected YAML structure");
        }
    }

    private List<KeyValuePair<YamlText, YamlItem>> ReadEntries(int depth)
    {
        var entries = new List<KeyValuePair<YamlText, YamlItem>>();
        var seen = new Dictionary<string, YamlText>(StringComparer.Ordinal);
        while (!_parser.TryConsume<MappingEnd>(out _))
        {
            var keyNode = ReadNode(depth + 1);
            if (keyNode is not YamlText key || key.IsNull)
            {
                throw new InputFormatException(keyNode.Location, $"expected a key (a word or a quantity), found {keyNode.Kind}");
            }

            if (seen.TryGetValue(key.Value, out var first))
            {
                throw new InputFormatException(key.Location, $"duplicate key \"{key.Value}\" (first given at line {first.Location.Line})");
            }

            seen.Add(key.Value, key);
            entries.Add(new(key, ReadNode(depth + 1)));
        }

        return entries;
    }

    private void Expect<T>()
        where T : ParsingEvent
    {
        if (!_parser.TryConsume<T>(out _))
        {
            var current = _parser.Current;
            throw new InputFormatException(current is null ? SourceLocation.OfFile(_source) : At(current), "unexpected YAML structure");
        }
    }

    private SourceLocation At(ParsingEvent e) => At(e.Start);

    private SourceLocation At(Mark mark) =>
        mark.Line > 0 ? new(_source, (int)mark.Line, (int)mark.Column) : SourceLocation.OfFile(_source);
}
