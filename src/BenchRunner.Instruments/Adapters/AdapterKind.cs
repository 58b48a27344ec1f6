namespace BenchRunner.Instruments.Adapters;

/// <summary>
/// Which adapter speaks to an instrument: the bench file's <c>adapter:</c> and the driver profile's
/// <c>adapter:</c> name it, each with its own words (<see cref="AdapterKindWords"/>).
/// </summary>
public enum AdapterKind
{
    /// <summary>
    /// A raw line dialect described entirely by a driver profile, spoken by
    /// <see cref="Profiles.ProfileInstrument"/>: <c>adapter: raw</c> in a profile, <c>adapter: profile</c> in a bench file.
    /// </summary>
    Raw,

    /// <summary>
    /// IEEE 488.2 / SCPI, optionally tailored by a scpi driver profile, spoken by
    /// <see cref="Scpi.ScpiInstrument"/>: <c>adapter: scpi</c> in both files.
    /// </summary>
    Scpi,
}
