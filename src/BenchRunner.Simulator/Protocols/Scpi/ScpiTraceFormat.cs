using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The FORMat subsystem of an analyser: how trace data is sent. <c>FORMat[:DATA] ASCii|REAL[,32|,64]</c>
/// (REAL alone is REAL,32) and <c>FORMat:BORDer NORMal|SWAPped</c> (big- or little-endian); ASCii
/// and NORMal at power-on and after <c>*RST</c>, as in SCPI-1999 (from memory).
/// </summary>
internal sealed class ScpiTraceFormat
{
    public ScpiDataFormat Format { get; private set; } = ScpiDataFormat.Ascii;

    public ScpiByteOrder ByteOrder { get; private set; } = ScpiByteOrder.Normal;

    public void Declare(ScpiCommandTree tree)
    {
        tree.Command("FORMat[:DATA]", c =>
            {
                c.ExpectParameters(1, 2);
                var real = c.Choice(0, ("ASCii", false), ("REAL", true));
                if (!real)
                {
                    c.ExpectParameters(1, 1);
                    Format = ScpiDataFormat.Ascii;
                    return;
                }

                Format = (c.Has(1) ? c.Integer(1) : 32) switch
                {
                    32 => ScpiDataFormat.Real32,
                    64 => ScpiDataFormat.Real64,
                    _ => throw new ScpiCommandException(ScpiStandardErrors.IllegalParameterValue),
                };
            })
            .Query("FORMat[:DATA]?", c =>
            {
                c.ExpectParameters(0, 0);
                return ScpiResponse.Text(Format switch
                {
                    ScpiDataFormat.Real32 => "REAL,32",
                    ScpiDataFormat.Real64 => "REAL,64",
                    _ => "ASC",
                });
            })
            .Command("FORMat:BORDer", c =>
            {
                c.ExpectParameters(1, 1);
                ByteOrder = c.Choice(0, ("NORMal", ScpiByteOrder.Normal), ("SWAPped", ScpiByteOrder.Swapped));
            })
            .Query("FORMat:BORDer?", c =>
            {
                c.ExpectParameters(0, 0);
                return ScpiResponse.Text(ByteOrder == ScpiByteOrder.Swapped ? "SWAP" : "NORM");
            });
    }

    public void Reset()
    {
        Format = ScpiDataFormat.Ascii;
        ByteOrder = ScpiByteOrder.Normal;
    }

    public ScpiResponse Encode(IReadOnlyList<double> values) => ScpiResponse.Numbers(values, Format, ByteOrder);
}
