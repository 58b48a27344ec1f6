using System.Text;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// One entry of an instrument's error queue, as <c>SYSTem:ERRor?</c> returns it:
/// <c>&lt;code&gt;,"&lt;text&gt;"</c>, e.g. <c>-113,"Undefined header"</c>. Code 0 means the queue is empty.
/// </summary>
/// <param name="Code">The error number: 0 for none, negative for SCPI standard errors, positive for the instrument's own.</param>
/// <param name="Text">The error text, with any doubled quotes undone.</param>
public readonly record struct ScpiError(int Code, string Text)
{
    /// <summary>The code of the entry that stands for lost errors: -350 "Queue overflow" (SCPI-1999).</summary>
    public const int QueueOverflowCode = -350;

    /// <summary>True for the "no error" entry (code 0, whatever its text or sign).</summary>
    public bool IsNoError => Code == 0;

    /// <summary>True for -350 "Queue overflow": more errors happened than the queue could hold, and the rest were lost.</summary>
    public bool IsQueueOverflow => Code == QueueOverflowCode;

    /// <summary>
    /// Parses an entry. The number decides (<c>+0,"No error"</c> and <c>0,"No error"</c> are both
    /// "no error"); the text may hold commas and doubled quotes (<c>""</c> stands for one <c>"</c>),
    /// may use single quotes, and is taken as it stands when the instrument sends it unquoted.
    /// </summary>
    public static ParseResult<ScpiError> Parse(string? reply)
    {
        var text = reply?.Trim() ?? "";
        int comma = text.IndexOf(',');
        var codeText = comma < 0 ? text : text[..comma];
        var code = ScpiNumber.ParseInteger(codeText);
        if (!code.Success || code.Value is < int.MinValue or > int.MaxValue)
        {
            return ParseResult<ScpiError>.Fail(
                $"\"{InstrumentException.Printable(text)}\" is not an error-queue entry; expected a number, a comma and a quoted text, such as -113,\"Undefined header\"");
        }

        var rest = comma < 0 ? "" : text[(comma + 1)..].Trim();
        if (rest.Length == 0 || rest[0] is not ('"' or '\''))
        {
            return ParseResult<ScpiError>.Ok(new ScpiError((int)code.Value, rest));
        }

        return Unquote(rest).Select(unquoted => new ScpiError((int)code.Value, unquoted));
    }

    /// <summary>Formats as the instrument would send it, e.g. <c>-113,"Undefined header"</c>.</summary>
    public override string ToString() => $"{Code},\"{Text.Replace("\"", "\"\"", StringComparison.Ordinal)}\"";

    private static ParseResult<string> Unquote(string quoted)
    {
        char quote = quoted[0];
        var builder = new StringBuilder(quoted.Length);
        for (int i = 1; i < quoted.Length; i++)
        {
            if (quoted[i] != quote)
            {
                builder.Append(quoted[i]);
            }
            else if (i + 1 < quoted.Length && quoted[i + 1] == quote)
            {
                builder.Append(quote);
                i++;
            }
            else if (quoted[(i + 1)..].Trim().Length == 0)
            {
                return ParseResult<string>.Ok(builder.ToString());
            }
            else
            {
                return ParseResult<string>.Fail(
                    $"the error text {InstrumentException.Printable(quoted)} has more after its closing quote; a quote inside the text must be doubled");
            }
        }

        return ParseResult<string>.Fail($"the error text {InstrumentException.Printable(quoted)} has no closing quote");
    }
}
