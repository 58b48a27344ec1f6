namespace BenchRunner.Simulator.Tests.Support;

/// <summary>A clock that moves only when told to.</summary>
internal sealed class ManualTimeProvider : TimeProvider
{
    private long _ticks;

    /// <inheritdoc/>
    public override long TimestampFrequency => TimeSpan.TicksPerSecond;

    /// <inheritdoc/>
    public override long GetTimestamp() => _ticks;

    /// <inheritdoc/>
    public override DateTimeOffset GetUtcNow() => new DateTimeOffset(2024, 6, 1, 8, 0, 0, TimeSpan.Zero).AddTicks(_ticks);

    /// <summary>Moves the clock on.</summary>
    public void Advance(TimeSpan by) => _ticks += by.Ticks;
}
