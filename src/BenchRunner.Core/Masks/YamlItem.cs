using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Masks;

/// <summary>
/// A node of a parsed YAML document with the place it starts, so that every complaint about a
/// user's file can name file, line and column. Built by <see cref="YamlTreeReader"/>.
/// </summary>
internal abstract class YamlItem(SourceLocation location)
{
    /// <summary>Where the node starts (its first character, a quote included).</summary>
    public SourceLocation Location { get; } = location;

    /// <summary>What the node is, for messages: "text", "a list", "a mapping" or "nothing".</summary>
    public abstract string Kind { get; }
}

/// <summary>A scalar: one piece of text.</summary>
internal sealed class YamlText(SourceLocation location, string value, bool isPlain) : YamlItem(location)
{
    /// <summary>The text as written, quotes removed.</summary>
    public string Value { get; } = value;

    /// <summary>True when written without quotes.</summary>
    public bool IsPlain { get; } = isPlain;

    /// <summary>True for YAML's empty value: nothing, <c>~</c> or <c>null</c>, unquoted.</summary>
    public bool IsNull => IsPlain && Value is "" or "~" or "null" or "Null" or "NULL";

    public override string Kind => IsNull ? "nothing" : "text";
}

/// <summary>A sequence (list) of nodes.</summary>
internal sealed class YamlList(SourceLocation location, IReadOnlyList<YamlItem> items) : YamlItem(location)
{
    public IReadOnlyList<YamlItem> Items { get; } = items;

    public override string Kind => "a list";
}

/// <summary>A mapping of scalar keys to nodes, in file order, with no key twice.</summary>
internal sealed class YamlMap(SourceLocation location, IReadOnlyList<KeyValuePair<YamlText, YamlItem>> entries) : YamlItem(location)
{
    public IReadOnlyList<KeyValuePair<YamlText, YamlItem>> Entries { get; } = entries;

    public override string Kind => "a mapping";
}
