using System.Globalization;
using System.Text.RegularExpressions;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// Recognises a reply line in which the device reports an error (<c>error-reply:</c>), e.g.
/// <c>^err (?&lt;code&gt;\d+) (?&lt;text&gt;.*)$</c>. The optional groups <c>code</c> and <c>text</c>
/// give the error number and text; without them the number is 0 and the text the whole line.
/// </summary>
public sealed class ErrorReplyRule
{
    internal ErrorReplyRule(Regex pattern) => Pattern = pattern;

    /// <summary>The pattern a reply line must match to be an error.</summary>
    public Regex Pattern { get; }

    /// <summary>True when <paramref name="line"/> reports an error; gives its number and text.</summary>
    public bool TryMatch(string line, out int code, out string text)
    {
        ArgumentNullException.ThrowIfNull(line);
        var match = Pattern.Match(line);
        code = 0;
        text = line.Trim();
        if (!match.Success)
        {
            return false;
        }

        if (match.Groups["code"] is { Success: true } c)
        {
            int.TryParse(c.Value.Trim(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out code);
        }

        if (match.Groups["text"] is { Success: true } t)
        {
            text = t.Value.Trim();
        }

        return true;
    }
}
