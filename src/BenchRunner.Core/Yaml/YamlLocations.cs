using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.Yaml;

/// <summary>Locations inside a scalar, so that a problem in part of a value is reported at that part.</summary>
public static class YamlLocations
{
    /// <summary>
    /// The location of character <paramref name="index"/> of <paramref name="text"/>'s value.
    /// Exact for a one-line scalar, plain or quoted, without escape sequences; for text spanning
    /// lines it is the scalar's own start.
    /// </summary>
    public static SourceLocation Within(YamlText text, int index)
    {
        ArgumentNullException.ThrowIfNull(text);
        var start = text.Location;
        if (start.Line == 0 || start.Column == 0 || text.Value.Contains('\n') || index < 0)
        {
            return start;
        }

        return start with { Column = start.Column + (text.IsPlain ? 0 : 1) + Math.Min(index, text.Value.Length) };
    }
}
