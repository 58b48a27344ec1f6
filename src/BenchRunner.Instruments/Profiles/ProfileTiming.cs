namespace BenchRunner.Instruments.Profiles;

/// <summary>A profile's timeouts and settle delays (<c>timing:</c>).</summary>
/// <param name="CommandTimeout">The longest wait for the reply to a setting or query: 2 s by default.</param>
/// <param name="SweepTimeout">The longest wait for a sweep to finish and for its data: 30 s by default.</param>
/// <param name="SettleAfterSetting">Waited after a change of settings before the call returns: none by default.</param>
/// <param name="SettleBeforeRead">Waited after a sweep is triggered before its data is read: none by default.</param>
public sealed record ProfileTiming(TimeSpan CommandTimeout, TimeSpan SweepTimeout, TimeSpan SettleAfterSetting, TimeSpan SettleBeforeRead)
{
    /// <summary>The defaults: 2 s per command, 30 s per sweep, no settle delays.</summary>
    public static ProfileTiming Default { get; } = new(TimeSpan.FromSeconds(2), TimeSpan.FromSeconds(30), TimeSpan.Zero, TimeSpan.Zero);
}
