using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Yaml;

/// <summary>
/// A node of a parsed YAML document with the place it starts, so that every complaint about a
/// user's file can name file, line and column. Built by <see cref="YamlTreeReader"/>.
/// </summary>
public abstract class YamlItem(SourceLocation location)
{
    /// <summary>Where the node starts (its first character, a quote included).</summary>
    public SourceLocation Location { get; } = location;

    /// <summary>What the node is, for messages: "text", "a list", "a mapping" or "nothing".</summary>
    public abstract string Kind { get; }
}
