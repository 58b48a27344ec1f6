namespace BenchRunner.Instruments.Profiles;

/// <summary>How the values of a point are written, decided by the grammar's columns.</summary>
public enum ValueForm
{
    /// <summary>Real and imaginary parts (<c>re</c>, <c>im</c>).</summary>
    RealImaginary,

    /// <summary>Magnitude in dB and angle in degrees (<c>db</c>, <c>deg</c>), as Touchstone's DB format.</summary>
    DecibelAngle,

    /// <summary>Linear magnitude and angle in degrees (<c>mag</c>, <c>deg</c>), as Touchstone's MA format.</summary>
    MagnitudeAngle,

    /// <summary>A power level in dBm (<c>dbm</c>).</summary>
    Power,
}
