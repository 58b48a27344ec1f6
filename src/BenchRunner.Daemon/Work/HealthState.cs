namespace BenchRunner.Daemon.Work;

/// <summary>What the daemon knows of an instrument's health.</summary>
public enum HealthState
{
    /// <summary>Not tried yet.</summary>
    Unknown,

    /// <summary>Answered the last time it was tried.</summary>
    Healthy,

    /// <summary>Did not answer; it is tried again with growing waits, and plans that need it wait.</summary>
    Faulty,
}
