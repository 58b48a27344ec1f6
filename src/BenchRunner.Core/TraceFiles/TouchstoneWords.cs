using System.Numerics;

namespace BenchRunner.Core.TraceFiles;

/// <summary>The option-line words of Touchstone and the decoding of its number pairs.</summary>
internal static class TouchstoneWords
{
    /// <summary>The unit as a power of ten of hertz: 0, 3, 6 or 9.</summary>
    public static int PowerOfTen(TouchstoneFrequencyUnit unit) => unit switch
    {
        TouchstoneFrequencyUnit.Hertz => 0,
        TouchstoneFrequencyUnit.Kilohertz => 3,
        TouchstoneFrequencyUnit.Megahertz => 6,
        TouchstoneFrequencyUnit.Gigahertz => 9,
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, null),
    };

    public static string Word(TouchstoneFrequencyUnit unit) => unit switch
    {
        TouchstoneFrequencyUnit.Hertz => "Hz",
        TouchstoneFrequencyUnit.Kilohertz => "kHz",
        TouchstoneFrequencyUnit.Megahertz => "MHz",
        TouchstoneFrequencyUnit.Gigahertz => "GHz",
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, null),
    };

    public static string Word(TouchstoneFormat format) => format switch
    {
        TouchstoneFormat.RealImaginary => "RI",
        TouchstoneFormat.MagnitudeAngle => "MA",
        TouchstoneFormat.DecibelAngle => "DB",
        _ => throw new ArgumentOutOfRangeException(nameof(format), format, null),
    };

    public static TouchstoneFrequencyUnit? UnitFromWord(string word) => word.ToLowerInvariant() switch
    {
        "hz" => TouchstoneFrequencyUnit.Hertz,
        "khz" => TouchstoneFrequencyUnit.Kilohertz,
        "mhz" => TouchstoneFrequencyUnit.Megahertz,
        "ghz" => TouchstoneFrequencyUnit.Gigahertz,
        _ => null,
    };

    public static TouchstoneParameter? ParameterFromWord(string word) => word.ToLowerInvariant() switch
    {
        "s" => TouchstoneParameter.S,
        "y" => TouchstoneParameter.Y,
        "z" => TouchstoneParameter.Z,
        "h" => TouchstoneParameter.H,
        "g" => TouchstoneParameter.G,
        _ => null,
    };

    public static TouchstoneFormat? FormatFromWord(string word) => word.ToLowerInvariant() switch
    {
        "ri" => TouchstoneFormat.RealImaginary,
        "ma" => TouchstoneFormat.MagnitudeAngle,
        "db" => TouchstoneFormat.DecibelAngle,
        _ => null,
    };

    /// <summary>The complex value written as the pair (<paramref name="first"/>, <paramref name="second"/>).</summary>
    public static Complex Decode(TouchstoneFormat format, double first, double second) => format switch
    {
        TouchstoneFormat.RealImaginary => new Complex(first, second),
        TouchstoneFormat.MagnitudeAngle => Complex.FromPolarCoordinates(first, second * Math.PI / 180),
        TouchstoneFormat.DecibelAngle => Complex.FromPolarCoordinates(Math.Pow(10, first / 20), second * Math.PI / 180),
        _ => throw new ArgumentOutOfRangeException(nameof(format), format, null),
    };

    /// <summary>
    /// The pair that writes <paramref name="value"/>. In dB a magnitude of zero is written as
    /// <see cref="Traces.ComplexTrace.FloorDb"/>, since 20·log10(0) has no number.
    /// </summary>
    public static (double First, double Second) Encode(TouchstoneFormat format, Complex value)
    {
        double degrees = value.Phase * 180 / Math.PI;
        return format switch
        {
            TouchstoneFormat.RealImaginary => (value.Real, value.Imaginary),
            TouchstoneFormat.MagnitudeAngle => (value.Magnitude, degrees),
            TouchstoneFormat.DecibelAngle => (
                value.Magnitude > 0 ? Math.Max(Traces.ComplexTrace.FloorDb, 20 * Math.Log10(value.Magnitude)) : Traces.ComplexTrace.FloorDb,
                degrees),
            _ => throw new ArgumentOutOfRangeException(nameof(format), format, null),
        };
    }
}
