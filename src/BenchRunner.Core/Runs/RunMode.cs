namespace BenchRunner.Core.Runs;

/// <summary>What kind of run it is. Stored as <c>single</c>, <c>tuning</c> or <c>batch</c>.</summary>
public enum RunMode
{
    /// <summary>One pass through a plan.</summary>
    Single,

    /// <summary>Continuous sweeps while someone adjusts the board; not a verdict on the board.</summary>
    Tuning,

    /// <summary>One board of a lot tested in a batch.</summary>
    Batch,
}
