namespace BenchRunner.Execution.Running;

/// <summary>
/// The runner refused a setting that would exceed a declared safety limit (for example a
/// generator level that would overdrive an analyser's input through the declared path).
/// Nothing was sent to the instrument.
/// </summary>
public sealed class SafetyRefusedException(string message) : Exception(message);
