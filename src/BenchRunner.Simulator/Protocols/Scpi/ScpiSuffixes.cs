namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The suffixes of numeric parameters. Multipliers follow IEEE 488.2 §7.7.3.4 (from memory): EX
/// 1e18, PE 1e15, T 1e12, G 1e9, MA 1e6, K 1e3, M 1e-3, U 1e-6, N 1e-9, P 1e-12, F 1e-15, A 1e-18;
/// as the suffixes are case-insensitive, <c>MHZ</c> is the one exception and means megahertz.
/// </summary>
internal static class ScpiSuffixes
{
    private static readonly Dictionary<string, double> Multipliers = new(StringComparer.Ordinal)
    {
        [""] = 1,
        ["EX"] = 1e18,
        ["PE"] = 1e15,
        ["T"] = 1e12,
        ["G"] = 1e9,
        ["MA"] = 1e6,
        ["K"] = 1e3,
        ["M"] = 1e-3,
        ["U"] = 1e-6,
        ["N"] = 1e-9,
        ["P"] = 1e-12,
        ["F"] = 1e-15,
        ["A"] = 1e-18,
    };

    /// <summary>The factor to the unit's base for <paramref name="suffix"/> (upper case), or null when it does not fit the unit.</summary>
    public static double? Multiplier(ScpiUnit unit, string suffix) => unit switch
    {
        ScpiUnit.Hertz when suffix == "MHZ" => 1e6,
        ScpiUnit.Hertz when suffix.EndsWith("HZ", StringComparison.Ordinal) && Multipliers.TryGetValue(suffix[..^2], out var factor) => factor,
        ScpiUnit.Decibel when suffix == "DB" => 1,
        ScpiUnit.DecibelMilliwatt when suffix == "DBM" => 1,
        _ => null,
    };
}
