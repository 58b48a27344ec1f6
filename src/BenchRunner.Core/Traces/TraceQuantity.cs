namespace BenchRunner.Core.Traces;

/// <summary>What a trace measures.</summary>
public enum TraceQuantity
{
    /// <summary>Input reflection coefficient (port 1).</summary>
    S11,

    /// <summary>Forward transmission coefficient (port 1 to port 2).</summary>
    S21,

    /// <summary>Reverse transmission coefficient (port 2 to port 1).</summary>
    S12,

    /// <summary>Output reflection coefficient (port 2).</summary>
    S22,

    /// <summary>Absolute power per frequency bin, as a spectrum analyser shows it.</summary>
    Power,
}
