using System.Text;

namespace BenchRunner.Instruments.Capture;

/// <summary>
/// The two payload encodings of the capture format. Escaped text: printable ASCII as it is,
/// <c>\\</c>, <c>\n</c>, <c>\r</c>, <c>\t</c>, and <c>\xHH</c> for every other byte and for a
/// space that ends the payload (so that trimming trailing blanks cannot lose it). Base64
/// (RFC 4648 §4, with padding) for chunks where it is shorter.
/// </summary>
internal static class CaptureEscaping
{
    private const string HexDigits = "0123456789ABCDEF";

    /// <summary>Encodes <paramref name="data"/> in escaped text.</summary>
    public static string Escape(ReadOnlySpan<byte> data)
    {
        var builder = new StringBuilder(data.Length + 8);
        for (int i = 0; i < data.Length; i++)
        {
            byte b = data[i];
            switch (b)
            {
                case (byte)'\\': builder.Append(@"\\"); break;
                case (byte)'\n': builder.Append(@"\n"); break;
                case (byte)'\r': builder.Append(@"\r"); break;
                case (byte)'\t': builder.Append(@"\t"); break;
                case (byte)' ' when i == data.Length - 1: builder.Append(@"\x20"); break;
                case >= 0x20 and <= 0x7E: builder.Append((char)b); break;
                default: builder.Append(@"\x").Append(HexDigits[b >> 4]).Append(HexDigits[b & 0xF]); break;
            }
        }

        return builder.ToString();
    }

    /// <summary>The length of <see cref="Escape"/>'s result, without building it.</summary>
    public static int EscapedLength(ReadOnlySpan<byte> data)
    {
        int length = 0;
        for (int i = 0; i < data.Length; i++)
        {
            length += data[i] switch
            {
                (byte)'\\' or (byte)'\n' or (byte)'\r' or (byte)'\t' => 2,
                (byte)' ' when i == data.Length - 1 => 4,
                >= 0x20 and <= 0x7E => 1,
                _ => 4,
            };
        }

        return length;
    }

    /// <summary>The length of the padded base64 form of <paramref name="byteCount"/> bytes.</summary>
    public static int Base64Length(int byteCount) => (byteCount + 2) / 3 * 4;

    /// <summary>The writer's rule: base64 only when it is strictly shorter than escaped text.</summary>
    public static bool PreferBase64(ReadOnlySpan<byte> data) => Base64Length(data.Length) < EscapedLength(data);

    /// <summary>
    /// Decodes escaped text. On failure returns null and sets <paramref name="errorIndex"/> to the
    /// index of the offending character in <paramref name="text"/> and <paramref name="error"/> to what was expected.
    /// </summary>
    public static byte[]? TryUnescape(string text, int start, out int errorIndex, out string error)
    {
        var bytes = new List<byte>(text.Length - start);
        errorIndex = -1;
        error = "";
        for (int i = start; i < text.Length; i++)
        {
            char c = text[i];
            if (c != '\\')
            {
                if (c is < ' ' or > '~')
                {
                    errorIndex = i;
                    error = $"the character {Describe(c)} must be written as an escape (\\n, \\r, \\t or \\xHH)";
                    return null;
                }

                bytes.Add((byte)c);
                continue;
            }

            if (i + 1 >= text.Length)
            {
                errorIndex = i;
                error = "a backslash ends the line; expected \\\\, \\n, \\r, \\t or \\xHH";
                return null;
            }

            char kind = text[i + 1];
            switch (kind)
            {
                case '\\': bytes.Add((byte)'\\'); i++; break;
                case 'n': bytes.Add((byte)'\n'); i++; break;
                case 'r': bytes.Add((byte)'\r'); i++; break;
                case 't': bytes.Add((byte)'\t'); i++; break;
                case 'x':
                    if (i + 3 < text.Length && HexValue(text[i + 2]) is int high and >= 0 && HexValue(text[i + 3]) is int low and >= 0)
                    {
                        bytes.Add((byte)((high << 4) | low));
                        i += 3;
                        break;
                    }

                    errorIndex = i;
                    error = "expected two hexadecimal digits after \\x";
                    return null;
                default:
                    errorIndex = i;
                    error = $"unknown escape \"\\{(kind is < ' ' or > '~' ? "?" : kind.ToString())}\"; expected \\\\, \\n, \\r, \\t or \\xHH";
                    return null;
            }
        }

        return bytes.ToArray();
    }

    /// <summary>
    /// Decodes padded base64, checking each character so that a failure can name its column.
    /// Same contract as <see cref="TryUnescape"/>.
    /// </summary>
    public static byte[]? TryDecodeBase64(string text, int start, out int errorIndex, out string error)
    {
        errorIndex = -1;
        error = "";
        int length = text.Length - start;
        int padding = 0;
        for (int i = start; i < text.Length; i++)
        {
            char c = text[i];
            bool letter = c is (>= 'A' and <= 'Z') or (>= 'a' and <= 'z') or (>= '0' and <= '9') or '+' or '/';
            if (c == '=' && i >= text.Length - 2)
            {
                padding++;
                continue;
            }

            if (!letter || padding > 0)
            {
                errorIndex = i;
                error = $"the character {Describe(c)} is not base64 (A-Z, a-z, 0-9, +, / and = padding at the end)";
                return null;
            }
        }

        if (length % 4 != 0)
        {
            errorIndex = text.Length;
            error = $"base64 text comes in groups of four characters; this one has {length}";
            return null;
        }

        return Convert.FromBase64String(text[start..]);
    }

    private static int HexValue(char c) => c switch
    {
        >= '0' and <= '9' => c - '0',
        >= 'A' and <= 'F' => c - 'A' + 10,
        >= 'a' and <= 'f' => c - 'a' + 10,
        _ => -1,
    };

    public static string Describe(char c) => c is >= '!' and <= '~' ? $"'{c}'" : $"U+{(int)c:X4}";
}
