namespace BenchRunner.Instruments.Profiles;

/// <summary>One <c>{name:type}</c> placeholder of a <see cref="CommandTemplate"/>.</summary>
/// <param name="Name">The value it stands for, e.g. <c>start</c>.</param>
/// <param name="Type">How the value is written.</param>
/// <param name="Index">Where the placeholder's <c>{</c> stands in the template text (0-based).</param>
public sealed record Placeholder(string Name, PlaceholderType Type, int Index);
