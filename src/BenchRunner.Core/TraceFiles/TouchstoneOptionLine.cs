using BenchRunner.Core.Diagnostics;

namespace BenchRunner.Core.TraceFiles;

/// <summary>
/// The option line <c># &lt;unit&gt; &lt;parameter&gt; &lt;format&gt; R &lt;ohms&gt;</c> of a Touchstone file.
/// Every field may be left out (defaults: GHz, S, MA, R 50; a bare <c>#</c> is legal), words are
/// case-insensitive and, since each kind of word is distinct, accepted in any order.
/// </summary>
internal sealed record TouchstoneOptionLine(
    TouchstoneFrequencyUnit Unit,
    TouchstoneParameter Parameter,
    TouchstoneFormat Format,
    double ReferenceOhms)
{
    private const string Expected =
        "a frequency unit (Hz, kHz, MHz, GHz), a parameter (S, Y, Z), a format (DB, MA, RI) or \"R <ohms>\"";

    /// <summary>The defaults of a bare <c>#</c>.</summary>
    public static TouchstoneOptionLine Defaults { get; } =
        new(TouchstoneFrequencyUnit.Gigahertz, TouchstoneParameter.S, TouchstoneFormat.MagnitudeAngle, 50);

    /// <summary>The frequency unit as a power of ten of hertz.</summary>
    public int PowerOfTen => TouchstoneWords.PowerOfTen(Unit);

    /// <summary>Parses the option line whose <c>#</c> is at 0-based <paramref name="hashIndex"/>.</summary>
    /// <exception cref="InputFormatException">An unknown or repeated word, a bad resistance, or H/G parameters.</exception>
    public static TouchstoneOptionLine Parse(string content, int hashIndex, string source, int line)
    {
        var tokens = LineTokenizer.Split(content, hashIndex + 1);
        TouchstoneFrequencyUnit? unit = null;
        TouchstoneParameter? parameter = null;
        TouchstoneFormat? format = null;
        double? ohms = null;

        SourceLocation At(TextToken t) => new(source, line, t.Column);

        for (int i = 0; i < tokens.Count; i++)
        {
            var token = tokens[i];
            if (TouchstoneWords.UnitFromWord(token.Text) is { } u)
            {
                unit = unit is null ? u : throw Twice(At(token), "frequency unit", token.Text);
            }
            else if (TouchstoneWords.ParameterFromWord(token.Text) is { } p)
            {
                if (parameter is not null)
                {
                    throw Twice(At(token), "parameter", token.Text);
                }

                if (p is TouchstoneParameter.H or TouchstoneParameter.G)
                {
                    throw new InputFormatException(At(token),
                        $"{p} parameters are not supported: only S, Y and Z data can be read (as S-parameters)");
                }

                parameter = p;
            }
            else if (TouchstoneWords.FormatFromWord(token.Text) is { } f)
            {
                format = format is null ? f : throw Twice(At(token), "format", token.Text);
            }
            else if (token.Text.Equals("R", StringComparison.OrdinalIgnoreCase))
            {
                if (ohms is not null)
                {
                    throw Twice(At(token), "reference resistance", token.Text);
                }

                if (i + 1 >= tokens.Count)
                {
                    throw new InputFormatException(new SourceLocation(source, line, token.Column + token.Text.Length),
                        "expected a reference resistance in ohms after \"R\", found the end of the line");
                }

                var value = tokens[++i];
                if (!TraceFileText.TryParseNumber(value.Text, out var r) || r <= 0)
                {
                    throw new InputFormatException(At(value),
                        $"expected a positive reference resistance in ohms after \"R\", found \"{value.Text}\"");
                }

                ohms = r;
            }
            else
            {
                throw new InputFormatException(At(token), $"expected {Expected} in the option line, found \"{token.Text}\"");
            }
        }

        return new TouchstoneOptionLine(
            unit ?? Defaults.Unit,
            parameter ?? Defaults.Parameter,
            format ?? Defaults.Format,
            ohms ?? Defaults.ReferenceOhms);
    }

    private static InputFormatException Twice(SourceLocation at, string what, string word) =>
        new(at, $"the option line gives the {what} twice (again as \"{word}\")");
}
