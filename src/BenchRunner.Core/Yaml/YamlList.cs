using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Yaml;

/// <summary>A sequence (list) of nodes.</summary>
public sealed class YamlList(SourceLocation location, IReadOnlyList<YamlItem> items) : YamlItem(location)
{
    /// <summary>The items in file order.</summary>
    public IReadOnlyList<YamlItem> Items { get; } = items;

    /// <inheritdoc/>
    public override string Kind => "a list";
}
