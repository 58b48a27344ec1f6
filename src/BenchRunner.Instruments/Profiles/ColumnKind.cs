namespace BenchRunner.Instruments.Profiles;

/// <summary>What one column of a data line holds.</summary>
public enum ColumnKind
{
    /// <summary>The point's frequency in hertz (<c>freq-hz</c>).</summary>
    FrequencyHz,

    /// <summary>The point's frequency in kilohertz (<c>freq-khz</c>).</summary>
    FrequencyKhz,

    /// <summary>The point's frequency in megahertz (<c>freq-mhz</c>).</summary>
    FrequencyMhz,

    /// <summary>The point's frequency in gigahertz (<c>freq-ghz</c>).</summary>
    FrequencyGhz,

    /// <summary>The real part of an S-parameter (<c>re</c>).</summary>
    Real,

    /// <summary>The imaginary part of an S-parameter (<c>im</c>).</summary>
    Imaginary,

    /// <summary>The magnitude of an S-parameter in dB, 20·log10|S| (<c>db</c>).</summary>
    Decibels,

    /// <summary>The linear magnitude of an S-parameter, |S| (<c>mag</c>).</summary>
    Magnitude,

    /// <summary>The angle of an S-parameter in degrees (<c>deg</c>).</summary>
    Degrees,

    /// <summary>A power level in dBm (<c>dbm</c>).</summary>
    Dbm,

    /// <summary>A column that is read past (<c>skip</c>).</summary>
    Skip,
}
