using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Profiles;

/// <summary>The values a <see cref="CommandTemplate"/> is rendered with, by placeholder name.</summary>
public sealed class TemplateArguments
{
    private readonly Dictionary<string, (TemplateValueKind Kind, double Number)> _values = new(StringComparer.Ordinal);

    /// <summary>Sets a frequency.</summary>
    public TemplateArguments Set(string name, Frequency value) => Put(name, TemplateValueKind.Frequency, value.Hertz);

    /// <summary>Sets a level in dBm.</summary>
    public TemplateArguments Set(string name, Level value) => Put(name, TemplateValueKind.Level, value.Dbm);

    /// <summary>Sets a ratio in dB.</summary>
    public TemplateArguments Set(string name, Ratio value) => Put(name, TemplateValueKind.Ratio, value.Decibels);

    /// <summary>Sets a count.</summary>
    public TemplateArguments Set(string name, int value) => Put(name, TemplateValueKind.Count, value);

    /// <summary>Sets a switch.</summary>
    public TemplateArguments Set(string name, bool value) => Put(name, TemplateValueKind.Switch, value ? 1 : 0);

    internal bool TryGet(string name, out (TemplateValueKind Kind, double Number) value) => _values.TryGetValue(name, out value);

    private TemplateArguments Put(string name, TemplateValueKind kind, double number)
    {
        ArgumentException.ThrowIfNullOrEmpty(name);
        _values[name] = (kind, number);
        return this;
    }
}
