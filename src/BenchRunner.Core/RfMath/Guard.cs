namespace BenchRunner.Core.RfMath;

/// <summary>Argument checks shared by the RF formulas.</summary>
internal static class Guard
{
    /// <summary>Throws unless <paramref name="value"/> is finite and above zero.</summary>
    public static double Positive(double value, string paramName)
    {
        if (!double.IsFinite(value) || value <= 0)
        {
            throw new ArgumentOutOfRangeException(paramName, value, "Must be finite and above zero.");
        }

        return value;
    }

    /// <summary>Throws unless <paramref name="value"/> is finite and not negative.</summary>
    public static double NotNegative(double value, string paramName)
    {
        if (!double.IsFinite(value) || value < 0)
        {
            throw new ArgumentOutOfRangeException(paramName, value, "Must be finite and not negative.");
        }

        return value;
    }

    /// <summary>Throws unless <paramref name="value"/> is finite.</summary>
    public static double Finite(double value, string paramName)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentOutOfRangeException(paramName, value, "Must be finite.");
        }

        return value;
    }
}
