using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Daemon.Settings;

/// <summary>One setting as given, before it is checked: its text, where it was given, and the folder a relative path in it is taken from.</summary>
/// <param name="Text">The value as written.</param>
/// <param name="At">Where: a settings file line, <c>environment BENCHRUNNER_X</c> or <c>command line --x</c>.</param>
/// <param name="BaseFolder">The folder a relative path is taken from; null means the home folder.</param>
internal sealed record SettingValue(string Text, SourceLocation At, string? BaseFolder);
