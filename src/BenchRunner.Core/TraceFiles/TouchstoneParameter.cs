namespace BenchRunner.Core.TraceFiles;

/// <summary>The kind of network parameters a Touchstone file holds (the option line's parameter letter).</summary>
public enum TouchstoneParameter
{
    /// <summary><c>S</c>: scattering parameters (unitless).</summary>
    S,

    /// <summary><c>Y</c>: admittance parameters (siemens; normalised to the reference in version 1 files).</summary>
    Y,

    /// <summary><c>Z</c>: impedance parameters (ohms; normalised to the reference in version 1 files).</summary>
    Z,

    /// <summary><c>H</c>: hybrid parameters. Not read: no conversion to S is offered.</summary>
    H,

    /// <summary><c>G</c>: inverse hybrid parameters. Not read: no conversion to S is offered.</summary>
    G,
}
