namespace BenchRunner.Instruments.Profiles;

/// <summary>Which adapter speaks a driver profile (<c>adapter:</c>).</summary>
public enum AdapterKind
{
    /// <summary><c>raw</c>: a line dialect described entirely by the profile, spoken by <see cref="ProfileInstrument"/>.</summary>
    Raw,

    /// <summary>
    /// <c>scpi</c>: an IEEE 488.2 / SCPI instrument whose commands the profile names, spoken by
    /// <see cref="Scpi.ScpiInstrument"/>.
    /// </summary>
    Scpi,
}
