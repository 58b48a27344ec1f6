namespace BenchRunner.Simulator.Devices;

/// <summary>Where the trimmers are at one moment of a <see cref="TrimmerScript"/>.</summary>
/// <param name="At">The time since the script started.</param>
/// <param name="Settings">The trimmer settings at that moment.</param>
public readonly record struct TrimmerKeyframe(TimeSpan At, TrimmerSettings Settings);
