namespace BenchRunner.Daemon.Work;

/// <summary>One instrument's health as last seen.</summary>
/// <param name="Name">The instrument's name on the bench.</param>
/// <param name="Connection">Where it is reached.</param>
/// <param name="State">Healthy, faulty or not yet known.</param>
/// <param name="LastFault">What went wrong the last time it failed, or null.</param>
/// <param name="Faults">How many tries in a row have failed.</param>
/// <param name="NextTry">When a faulty instrument is tried next, or null.</param>
/// <param name="Since">When it entered its present state.</param>
public sealed record InstrumentHealth(string Name, string Connection, HealthState State, string? LastFault, int Faults, DateTimeOffset? NextTry, DateTimeOffset? Since);
