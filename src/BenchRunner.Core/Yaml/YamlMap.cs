using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Yaml;

/// <summary>A mapping of scalar keys to nodes, in file order, with no key twice.</summary>
public sealed class YamlMap(SourceLocation location, IReadOnlyList<KeyValuePair<YamlText, YamlItem>> entries) : YamlItem(location)
{
    /// <summary>The entries in file order.</summary>
    public IReadOnlyList<KeyValuePair<YamlText, YamlItem>> Entries { get; } = entries;

    /// <inheritdoc/>
    public override string Kind => "a mapping";
}
