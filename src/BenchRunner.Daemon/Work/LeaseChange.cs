namespace BenchRunner.Daemon.Work;

/// <summary>Instruments were taken or given back.</summary>
/// <param name="Holder">Who holds (or held) them: a job id, or <c>probe</c>.</param>
/// <param name="Instruments">The bench instruments, by name.</param>
/// <param name="Taken">True when taken, false when given back.</param>
/// <param name="At">When (the daemon's clock).</param>
public sealed record LeaseChange(string Holder, IReadOnlyList<string> Instruments, bool Taken, DateTimeOffset At);
