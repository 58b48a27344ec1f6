using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Simulator.Protocols.Raw;

/// <summary>The rules the three bench-dialect servers share (docs/simulator-dialect.md, "Common rules").</summary>
internal static partial class BenchDialect
{
    /// <summary>The device's line end.</summary>
    public const string LineEnd = "\r\n";

    /// <summary>The words of a command line: separated by spaces (several count as one).</summary>
    public static string[] Words(string line) => line.Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries);

    /// <summary>The identity line: <c>&lt;maker&gt;/&lt;model&gt; sn &lt;serial&gt; fw &lt;firmware&gt;</c>.</summary>
    public static string IdentityLine(InstrumentIdentity identity) =>
        $"{identity.Maker}/{identity.Model} sn {identity.Serial} fw {identity.Firmware}";

    /// <summary>The error line, e.g. <c>err 3 value out of range</c>.</summary>
    public static string ErrorLine(BenchDialectError error) => $"err {(int)error} {Text(error)}";

    public static string Text(BenchDialectError error) => error switch
    {
        BenchDialectError.UnknownCommand => "unknown command",
        BenchDialectError.WrongNumberOfArguments => "wrong number of arguments",
        BenchDialectError.ValueOutOfRange => "value out of range",
        BenchDialectError.NotANumber => "not a number",
        BenchDialectError.NoSweep => "no sweep",
        _ => throw new ArgumentOutOfRangeException(nameof(error), error, "Not a bench-dialect error."),
    };

    /// <summary>Refuses a command with the wrong number of words after it.</summary>
    public static void ExpectArguments(string[] words, int count)
    {
        if (words.Length != count + 1)
        {
            throw new BenchDialectException(BenchDialectError.WrongNumberOfArguments);
        }
    }

    /// <summary>A decimal number with a point (an exponent is allowed too); refused with <c>err 4</c> otherwise.</summary>
    public static decimal Number(string word)
    {
        if (!NumberPattern().IsMatch(word))
        {
            throw new BenchDialectException(BenchDialectError.NotANumber);
        }

        // Written as a number but too large even for a decimal: it is outside every range.
        return decimal.TryParse(word, NumberStyles.Float, CultureInfo.InvariantCulture, out var value)
            ? value
            : throw new BenchDialectException(BenchDialectError.ValueOutOfRange);
    }

    /// <summary>The value in another unit (megahertz to hertz); a product too large for a decimal is out of every range.</summary>
    public static decimal Scaled(decimal value, decimal factor)
    {
        try
        {
            return value * factor;
        }
        catch (OverflowException)
        {
            throw new BenchDialectException(BenchDialectError.ValueOutOfRange);
        }
    }

    /// <summary>Refuses with <c>err 3</c> a value outside the range or off its step (finer than its resolution).</summary>
    public static double Within(decimal value, SettingRange range)
    {
        if (!range.IsOnStep(value) || !range.Contains((double)value))
        {
            throw new BenchDialectException(BenchDialectError.ValueOutOfRange);
        }

        return (double)value;
    }

    /// <summary>
    /// Answers one command line the way every bench dialect server does: an empty line gets no
    /// answer; otherwise <paramref name="run"/>'s reply lines, or the <c>err</c> line of a refused
    /// command (a value out of range when the model refuses it), with the echo and prompt the
    /// dialect uses.
    /// </summary>
    public static byte[] Answer(string line, Func<string[], IReadOnlyList<string>> run, bool echo, string? prompt)
    {
        ArgumentNullException.ThrowIfNull(line);
        var words = Words(line);
        if (words.Length == 0)
        {
            return [];
        }

        IReadOnlyList<string> reply;
        try
        {
            reply = run(words);
        }
        catch (BenchDialectException ex)
        {
            reply = [ErrorLine(ex.Error)];
        }
        catch (ArgumentException)
        {
            reply = [ErrorLine(BenchDialectError.ValueOutOfRange)];
        }

        return Reply(echo ? line : null, reply, prompt);
    }

    /// <summary>The answer to a line longer than the host accepts: an unknown-command error.</summary>
    public static byte[] AnswerOverlong(string? prompt) => Reply(null, [ErrorLine(BenchDialectError.UnknownCommand)], prompt);

    /// <summary>The bytes of a reply: the echo (if any), each line ended with CR LF, then the prompt (if any).</summary>
    public static byte[] Reply(string? echo, IReadOnlyList<string> lines, string? prompt)
    {
        var text = new StringBuilder();
        if (echo is not null)
        {
            text.Append(echo).Append(LineEnd);
        }

        foreach (var line in lines)
        {
            text.Append(line).Append(LineEnd);
        }

        text.Append(prompt);
        return Encoding.Latin1.GetBytes(text.ToString());
    }

    [GeneratedRegex(@"^[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex NumberPattern();
}
