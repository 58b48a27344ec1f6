using System.Globalization;
using System.Text;

namespace BenchRunner.Instruments.Framing;

/// <summary>
/// IEEE 488.2 arbitrary block data. Definite length (§8.7.9): <c>#</c>, one non-zero digit n,
/// n digits giving the byte count, then the bytes (<c>#12AB</c> is the two bytes "AB").
/// Indefinite length (§8.7.10): <c>#0</c>, the bytes, then NL (with END on GPIB; on a serial
/// line or a socket, NL alone ends it, so such a block cannot carry a NL byte).
/// </summary>
public static class Ieee488Block
{
    /// <summary>The header of a definite-length block of <paramref name="byteCount"/> bytes, e.g. <c>#3804</c>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Negative, or more than nine digits.</exception>
    public static string DefiniteHeader(long byteCount)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(byteCount);
        var digits = byteCount.ToString(CultureInfo.InvariantCulture);
        if (digits.Length > 9)
        {
            throw new ArgumentOutOfRangeException(nameof(byteCount), byteCount, "A definite-length block holds at most 999,999,999 bytes.");
        }

        return $"#{digits.Length}{digits}";
    }

    /// <summary>A whole definite-length block: header and payload.</summary>
    public static byte[] Encode(ReadOnlySpan<byte> payload)
    {
        var header = Encoding.ASCII.GetBytes(DefiniteHeader(payload.Length));
        var block = new byte[header.Length + payload.Length];
        header.CopyTo(block, 0);
        payload.CopyTo(block.AsSpan(header.Length));
        return block;
    }
}
