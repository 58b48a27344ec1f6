namespace BenchRunner.Instruments.Scpi;

/// <summary>Where a <see cref="ScpiSession"/> stands; it does work only when <see cref="Ready"/>.</summary>
public enum SessionState
{
    /// <summary>Not open (never opened, or closed). Open it first.</summary>
    Closed,

    /// <summary>Open and in step with the instrument: each command's reply is the next thing to arrive.</summary>
    Ready,

    /// <summary>
    /// Out of step: a reply timed out, could not be framed, or the operation was cancelled half-way,
    /// so a late reply may still be on its way. Refuses work until <see cref="ScpiSession.ResetAsync"/>
    /// succeeds.
    /// </summary>
    Broken,
}
