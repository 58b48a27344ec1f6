namespace BenchRunner.Simulator.Protocols;

/// <summary>
/// The values one setting of a simulated instrument accepts: <see cref="Minimum"/> to
/// <see cref="Maximum"/> (both included), its power-on and reset value <see cref="Default"/>, and
/// the <see cref="Step"/> it moves in (0 for any value). The unit is the one named by the property
/// that holds the range (hertz, dB, dBm, points, sweeps). The protocol servers answer
/// <c>MINimum</c>, <c>MAXimum</c> and <c>DEFault</c> from it and refuse values outside it.
/// </summary>
public readonly record struct SettingRange
{
    private SettingRange(double minimum, double maximum, double @default, double step)
    {
        Minimum = minimum;
        Maximum = maximum;
        Default = @default;
        Step = step;
    }

    /// <summary>The lowest value accepted (included).</summary>
    public double Minimum { get; }

    /// <summary>The highest value accepted (included).</summary>
    public double Maximum { get; }

    /// <summary>The value at power-on and after a reset.</summary>
    public double Default { get; }

    /// <summary>The resolution of the setting (1 for whole hertz, whole points or whole decibels); 0 when any value is taken.</summary>
    public double Step { get; }

    /// <summary>Creates a range.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A value that is not finite, a maximum below the minimum, a default outside the range, or a negative step.</exception>
    public static SettingRange Of(double minimum, double maximum, double @default, double step = 0)
    {
        if (!double.IsFinite(minimum) || !double.IsFinite(maximum) || !double.IsFinite(@default) || !double.IsFinite(step))
        {
            throw new ArgumentOutOfRangeException(nameof(minimum), "A setting range needs finite values.");
        }

        if (maximum < minimum)
        {
            throw new ArgumentOutOfRangeException(nameof(maximum), maximum, $"The maximum is below the minimum {minimum}.");
        }

        if (@default < minimum || @default > maximum)
        {
            throw new ArgumentOutOfRangeException(nameof(@default), @default, $"The default lies outside {minimum} to {maximum}.");
        }

        ArgumentOutOfRangeException.ThrowIfNegative(step);
        return new SettingRange(minimum, maximum, @default, step);
    }

    /// <summary>True when <paramref name="value"/> lies between the minimum and the maximum, both included (false for NaN).</summary>
    public bool Contains(double value) => value >= Minimum && value <= Maximum;

    /// <summary>The nearest value on the step grid (halves away from zero); the value itself when the step is 0.</summary>
    public double RoundToStep(double value) =>
        Step == 0 || !double.IsFinite(value) ? value : Math.Round(value / Step, MidpointRounding.AwayFromZero) * Step;

    /// <summary>True when <paramref name="value"/> is a whole multiple of the step (always, when the step is 0).</summary>
    public bool IsOnStep(decimal value) => Step == 0 || value % (decimal)Step == 0;
}
