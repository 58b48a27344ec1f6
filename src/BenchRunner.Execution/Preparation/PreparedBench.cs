using BenchRunner.Execution.Bench;

namespace BenchRunner.Execution.Preparation;

/// <summary>A bench read once: its definition and the exact text it was parsed from.</summary>
/// <param name="Definition">The bench.</param>
/// <param name="Text">The bench file's text, stored with every run on it.</param>
public sealed record PreparedBench(BenchDefinition Definition, string Text);
