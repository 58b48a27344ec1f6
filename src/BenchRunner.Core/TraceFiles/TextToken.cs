namespace BenchRunner.Core.TraceFiles;

/// <summary>A piece of a line of text with the 1-based column where it starts.</summary>
internal readonly record struct TextToken(string Text, int Column);
