namespace BenchRunner.Instruments.Profiles;

/// <summary>How a placeholder's value is written into a command (see <c>docs/profile-format.md</c>).</summary>
public enum PlaceholderType
{
    /// <summary>A frequency as a whole number of hertz, rounded: 137.5 MHz → <c>137500000</c>.</summary>
    Hz,

    /// <summary>A frequency in kilohertz, up to 3 decimals: 137.5 MHz → <c>137500</c>.</summary>
    Khz,

    /// <summary>A frequency in megahertz, up to 6 decimals: 137.5 MHz → <c>137.5</c>.</summary>
    Mhz,

    /// <summary>A frequency in gigahertz, up to 9 decimals: 137.5 MHz → <c>0.1375</c>.</summary>
    Ghz,

    /// <summary>A level in dBm, up to 3 decimals: <c>-20</c>, <c>-3.25</c>.</summary>
    Dbm,

    /// <summary>A ratio in dB, up to 3 decimals: <c>10</c>.</summary>
    Db,

    /// <summary>A whole number: <c>401</c>.</summary>
    Int,

    /// <summary>A switch, written with the profile's two words (<c>bool-words</c>, by default <c>on</c> and <c>off</c>).</summary>
    Bool,
}
