using System.Buffers.Binary;
using System.Globalization;
using System.Text;
using BenchRunner.Instruments.Framing;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// One response message unit (IEEE 488.2 §8.7), the answer to one query. The server joins the units
/// of one program message with <c>;</c> and ends them with LF.
/// </summary>
public readonly struct ScpiResponse
{
    private ScpiResponse(byte[] bytes) => Bytes = bytes;

    /// <summary>The unit's bytes, without separator or terminator.</summary>
    public byte[] Bytes { get; }

    /// <summary>A number: NR1 when it is whole and below 1e15 (<c>137500000</c>), otherwise the shortest text that reads back exactly (<c>-87.25</c>, <c>1.5E-05</c>).</summary>
    public static ScpiResponse Number(double value) => Text(FormatNumber(value));

    /// <summary>A whole number (NR1), e.g. <c>201</c>.</summary>
    public static ScpiResponse Integer(long value) => Text(value.ToString(CultureInfo.InvariantCulture));

    /// <summary>A switch state: <c>1</c> or <c>0</c>.</summary>
    public static ScpiResponse Boolean(bool on) => Text(on ? "1" : "0");

    /// <summary>Character or arbitrary ASCII response data sent as it stands, e.g. <c>REAL,32</c> or an identity.</summary>
    public static ScpiResponse Text(string text) => new(Encoding.Latin1.GetBytes(text));

    /// <summary>String response data: in double quotes, a quote inside doubled.</summary>
    public static ScpiResponse QuotedString(string text) => Text("\"" + text.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"");

    /// <summary>An IEEE 488.2 definite-length block (§8.7.9) holding <paramref name="payload"/>.</summary>
    public static ScpiResponse Block(ReadOnlySpan<byte> payload) => new(Ieee488Block.Encode(payload));

    /// <summary>
    /// Numbers in a data format: comma-separated text for <see cref="ScpiDataFormat.Ascii"/>, or a
    /// definite-length block of IEEE 754 single or double values in the given byte order.
    /// </summary>
    public static ScpiResponse Numbers(IReadOnlyList<double> values, ScpiDataFormat format, ScpiByteOrder order)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (format == ScpiDataFormat.Ascii)
        {
            return Text(string.Join(",", values.Select(FormatNumber)));
        }

        int size = format == ScpiDataFormat.Real32 ? sizeof(float) : sizeof(double);
        var payload = new byte[values.Count * size];
        bool big = order == ScpiByteOrder.Normal;
        for (int i = 0; i < values.Count; i++)
        {
            var slot = payload.AsSpan(i * size, size);
            switch (size, big)
            {
                case (sizeof(float), true): BinaryPrimitives.WriteSingleBigEndian(slot, (float)values[i]); break;
                case (sizeof(float), false): BinaryPrimitives.WriteSingleLittleEndian(slot, (float)values[i]); break;
                case (_, true): BinaryPrimitives.WriteDoubleBigEndian(slot, values[i]); break;
                default: BinaryPrimitives.WriteDoubleLittleEndian(slot, values[i]); break;
            }
        }

        return Block(payload);
    }

    private static string FormatNumber(double value)
    {
        if (double.IsNaN(value))
        {
            // SCPI-1999 Vol 1 §7.2.1.5: 9.91E37 stands for not-a-number (from memory).
            return "9.91E+37";
        }

        return value == Math.Floor(value) && Math.Abs(value) < 1e15
            ? ((long)value).ToString(CultureInfo.InvariantCulture)
            : value.ToString("R", CultureInfo.InvariantCulture);
    }
}
