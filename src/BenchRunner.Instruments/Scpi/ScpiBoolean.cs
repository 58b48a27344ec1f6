using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// Parses a boolean in a reply: <c>1</c>/<c>0</c> (what instruments normally send, possibly with a
/// sign) or <c>ON</c>/<c>OFF</c> (any letter case). Spaces around it are ignored.
/// </summary>
public static class ScpiBoolean
{
    /// <summary>Parses the reply; anything other than 0, 1, ON or OFF is a failure.</summary>
    public static ParseResult<bool> Parse(string? reply)
    {
        var text = reply?.Trim() ?? "";
        if (text.Equals("ON", StringComparison.OrdinalIgnoreCase))
        {
            return ParseResult<bool>.Ok(true);
        }

        if (text.Equals("OFF", StringComparison.OrdinalIgnoreCase))
        {
            return ParseResult<bool>.Ok(false);
        }

        return ScpiNumber.ParseInteger(text) is { Success: true, Value: 0 or 1 } number
            ? ParseResult<bool>.Ok(number.Value == 1)
            : ParseResult<bool>.Fail($"\"{InstrumentException.Printable(text)}\" is not a boolean; expected 0, 1, ON or OFF");
    }
}
