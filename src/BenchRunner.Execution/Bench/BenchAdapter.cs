namespace BenchRunner.Execution.Bench;

/// <summary>How the runner speaks to an instrument of the bench.</summary>
public enum BenchAdapter
{
    /// <summary>IEEE 488.2 / SCPI, optionally tailored by a scpi driver profile.</summary>
    Scpi,

    /// <summary>A raw line dialect described entirely by a driver profile file.</summary>
    Profile,
}
