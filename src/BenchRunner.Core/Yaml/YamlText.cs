using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Yaml;

/// <summary>A scalar: one piece of text.</summary>
public sealed class YamlText(SourceLocation location, string value, bool isPlain) : YamlItem(location)
{
    /// <summary>The text as written, quotes removed.</summary>
    public string Value { get; } = value;

    /// <summary>True when written without quotes.</summary>
    public bool IsPlain { get; } = isPlain;

    /// <summary>True for YAML's empty value: nothing, <c>~</c> or <c>null</c>, unquoted.</summary>
    public bool IsNull => IsPlain && Value is "" or "~" or "null" or "Null" or "NULL";

    /// <inheritdoc/>
    public override string Kind => IsNull ? "nothing" : "text";
}
