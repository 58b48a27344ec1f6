using System.Globalization;

namespace BenchRunner.Simulator.Devices;

/// <summary>The capacitance of the three preselector trimmers (input, middle, output), in picofarads.</summary>
public readonly record struct TrimmerSettings
{
    private TrimmerSettings(double input, double middle, double output)
    {
        InputPicofarads = input;
        MiddlePicofarads = middle;
        OutputPicofarads = output;
    }

    /// <summary>The trimmer of the input resonator, in pF.</summary>
    public double InputPicofarads { get; }

    /// <summary>The trimmer of the middle resonator, in pF.</summary>
    public double MiddlePicofarads { get; }

    /// <summary>The trimmer of the output resonator, in pF.</summary>
    public double OutputPicofarads { get; }

    /// <summary>The trimmer at position 0 (input), 1 (middle) or 2 (output), in pF.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Another position.</exception>
    public double this[int position] => position switch
    {
        0 => InputPicofarads,
        1 => MiddlePicofarads,
        2 => OutputPicofarads,
        _ => throw new ArgumentOutOfRangeException(nameof(position), position, "A preselector has trimmers 0, 1 and 2."),
    };

    /// <summary>Creates the settings.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A value not finite and positive.</exception>
    public static TrimmerSettings FromPicofarads(double input, double middle, double output) =>
        new(Check(input, nameof(input)), Check(middle, nameof(middle)), Check(output, nameof(output)));

    /// <summary>These settings with the trimmer at <paramref name="position"/> set to <paramref name="picofarads"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A position other than 0, 1, 2, or a value not finite and positive.</exception>
    public TrimmerSettings With(int position, double picofarads) => position switch
    {
        0 => FromPicofarads(picofarads, MiddlePicofarads, OutputPicofarads),
        1 => FromPicofarads(InputPicofarads, picofarads, OutputPicofarads),
        2 => FromPicofarads(InputPicofarads, MiddlePicofarads, picofarads),
        _ => throw new ArgumentOutOfRangeException(nameof(position), position, "A preselector has trimmers 0, 1 and 2."),
    };

    /// <summary>Formats as e.g. <c>1.822 pF, 5.121 pF, 1.812 pF</c>.</summary>
    public override string ToString() =>
        string.Join(", ", new[] { InputPicofarads, MiddlePicofarads, OutputPicofarads }.Select(v => v.ToString("0.###", CultureInfo.InvariantCulture) + " pF"));

    private static double Check(double picofarads, string paramName) =>
        double.IsFinite(picofarads) && picofarads > 0
            ? picofarads
            : throw new ArgumentOutOfRangeException(paramName, picofarads, "A trimmer capacitance must be finite and above zero.");
}
