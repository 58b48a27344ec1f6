namespace BenchRunner.Simulator.Circuits;

/// <summary>Argument checks shared by the simulator's models.</summary>
internal static class Require
{
    /// <summary>Throws unless <paramref name="value"/> is finite and above zero.</summary>
    public static double Positive(double value, string paramName) =>
        double.IsFinite(value) && value > 0
            ? value
            : throw new ArgumentOutOfRangeException(paramName, value, "Must be finite and above zero.");

    /// <summary>Throws unless <paramref name="value"/> is finite and not negative.</summary>
    public static double NotNegative(double value, string paramName) =>
        double.IsFinite(value) && value >= 0
            ? value
            : throw new ArgumentOutOfRangeException(paramName, value, "Must be finite and not negative.");

    /// <summary>Throws unless <paramref name="value"/> is finite.</summary>
    public static double Finite(double value, string paramName) =>
        double.IsFinite(value)
            ? value
            : throw new ArgumentOutOfRangeException(paramName, value, "Must be finite.");
}
