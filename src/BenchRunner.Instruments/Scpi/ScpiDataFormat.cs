namespace BenchRunner.Instruments.Scpi;

/// <summary>How trace data comes back, as set by <c>FORMat:DATA</c>.</summary>
public enum ScpiDataFormat
{
    /// <summary><c>ASCii</c>: comma-separated decimal numbers on one line.</summary>
    Ascii,

    /// <summary><c>REAL,32</c>: an IEEE 488.2 block of IEEE 754 single-precision numbers (4 bytes each).</summary>
    Real32,

    /// <summary><c>REAL,64</c>: an IEEE 488.2 block of IEEE 754 double-precision numbers (8 bytes each).</summary>
    Real64,
}
