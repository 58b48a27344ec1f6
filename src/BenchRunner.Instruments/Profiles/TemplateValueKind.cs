namespace BenchRunner.Instruments.Profiles;

/// <summary>What kind of value a template variable holds; it decides which placeholder types fit.</summary>
internal enum TemplateValueKind
{
    Frequency,
    Level,
    Ratio,
    Count,
    Switch,
}
