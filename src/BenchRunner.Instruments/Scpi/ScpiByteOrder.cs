namespace BenchRunner.Instruments.Scpi;

/// <summary>The byte order of binary numbers in a block, as set by <c>FORMat:BORDer</c>.</summary>
public enum ScpiByteOrder
{
    /// <summary><c>NORMal</c>: big-endian, most significant byte first (the SCPI default).</summary>
    Normal,

    /// <summary><c>SWAPped</c>: little-endian, least significant byte first.</summary>
    Swapped,
}
