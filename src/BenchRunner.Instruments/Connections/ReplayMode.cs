namespace BenchRunner.Instruments.Connections;

/// <summary>How closely a replayed session must follow its recording.</summary>
public enum ReplayMode
{
    /// <summary>Every command the host sends must match the recorded command; a difference is an error. The default.</summary>
    Strict,

    /// <summary>Commands are not compared; the recorded replies are played in order.</summary>
    Relaxed,
}
