namespace BenchRunner.Core.Quantities;

/// <summary>
/// A closed frequency range: <see cref="Start"/> and <see cref="Stop"/> are both included.
/// Start is never above stop.
/// </summary>
public readonly record struct FrequencyRange
{
    private FrequencyRange(Frequency start, Frequency stop)
    {
        Start = start;
        Stop = stop;
    }

    /// <summary>The lowest frequency in the range (included).</summary>
    public Frequency Start { get; }

    /// <summary>The highest frequency in the range (included).</summary>
    public Frequency Stop { get; }

    /// <summary>Stop minus start.</summary>
    public Frequency Width => Stop - Start;

    /// <summary>The arithmetic centre.</summary>
    public Frequency Centre => Frequency.FromHertz((Start.Hertz + Stop.Hertz) / 2);

    /// <summary>Creates the range from <paramref name="start"/> to <paramref name="stop"/>, both included.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Stop is below start.</exception>
    public static FrequencyRange Between(Frequency start, Frequency stop)
    {
        if (stop < start)
        {
            throw new ArgumentOutOfRangeException(nameof(stop), stop.Hertz, $"The range's stop ({stop}) is below its start ({start}).");
        }

        return new FrequencyRange(start, stop);
    }

    /// <summary>Creates the range <paramref name="centre"/> ± <paramref name="span"/>/2.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The range would reach below 0 Hz.</exception>
    public static FrequencyRange AroundCentre(Frequency centre, Frequency span) =>
        Between(Frequency.FromHertz(centre.Hertz - span.Hertz / 2), Frequency.FromHertz(centre.Hertz + span.Hertz / 2));

    /// <summary>True when <paramref name="frequency"/> lies in the range, ends included.</summary>
    public bool Contains(Frequency frequency) => frequency >= Start && frequency <= Stop;

    /// <summary>True when all of <paramref name="other"/> lies in this range.</summary>
    public bool Contains(FrequencyRange other) => other.Start >= Start && other.Stop <= Stop;

    /// <summary>Formats as e.g. <c>136 MHz to 139 MHz</c>.</summary>
    public override string ToString() => $"{Start} to {Stop}";
}
