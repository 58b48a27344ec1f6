using System.Globalization;

namespace BenchRunner.Core.Text;

/// <summary>
/// Counts in messages with the noun that agrees: "1 problem", "2 problems", "0 problems".
/// English only, as every message of the program is.
/// </summary>
public static class Counted
{
    /// <summary>The count and its noun, e.g. <c>Of(1, "problem")</c> is "1 problem".</summary>
    /// <param name="count">How many.</param>
    /// <param name="singular">The noun for one.</param>
    /// <param name="plural">The noun for any other count; <paramref name="singular"/> with "s" when null.</param>
    public static string Of(long count, string singular, string? plural = null) =>
        count.ToString(CultureInfo.InvariantCulture) + " " + Noun(count, singular, plural);

    /// <summary>The noun alone, singular for exactly one: <c>Noun(2, "sweep")</c> is "sweeps".</summary>
    /// <param name="count">How many.</param>
    /// <param name="singular">The noun for one.</param>
    /// <param name="plural">The noun for any other count; <paramref name="singular"/> with "s" when null.</param>
    public static string Noun(long count, string singular, string? plural = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(singular);
        return count is 1 or -1 ? singular : plural ?? singular + "s";
    }
}
