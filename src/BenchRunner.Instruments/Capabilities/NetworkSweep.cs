using BenchRunner.Core.Quantities;

namespace BenchRunner.Instruments.Capabilities;

/// <summary>A network analyser's sweep: start to stop (both included), number of points, optional IF bandwidth and averaging.</summary>
public sealed record NetworkSweep
{
    /// <summary>Creates a sweep.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Stop not above start, fewer than 2 points, or an average count below 1.</exception>
    public NetworkSweep(Frequency start, Frequency stop, int points, Frequency? ifBandwidth = null, int? averages = null)
    {
        if (stop <= start) throw new ArgumentOutOfRangeException(nameof(stop), "The sweep's stop must be above its start.");
        ArgumentOutOfRangeException.ThrowIfLessThan(points, 2);
        if (averages is < 1) throw new ArgumentOutOfRangeException(nameof(averages), "Averaging needs at least 1 sweep.");
        Start = start;
        Stop = stop;
        Points = points;
        IfBandwidth = ifBandwidth;
        Averages = averages;
    }

    /// <summary>The first frequency.</summary>
    public Frequency Start { get; }

    /// <summary>The last frequency.</summary>
    public Frequency Stop { get; }

    /// <summary>The number of points, at least 2.</summary>
    public int Points { get; }

    /// <summary>The IF (receiver) bandwidth, where the instrument has one.</summary>
    public Frequency? IfBandwidth { get; }

    /// <summary>How many sweeps to average, where the instrument can.</summary>
    public int? Averages { get; }
}
