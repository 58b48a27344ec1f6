using System.Globalization;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// A command with at most one typed placeholder, such as <c>SENSe:FREQuency:STARt {hz}</c> or
/// <c>OUTPut:STATe {state}</c> (see <see cref="ScpiPlaceholder"/> for the names). A template is a
/// single line: it must produce exactly one command, so that replies stay in step.
/// Created with <see cref="Parse"/>; filled with the <c>Render</c> overload of the placeholder's type.
/// </summary>
public sealed class ScpiCommandTemplate
{
    private static readonly Dictionary<string, ScpiPlaceholder> Names = new(StringComparer.Ordinal)
    {
        ["hz"] = ScpiPlaceholder.Hz,
        ["db"] = ScpiPlaceholder.Db,
        ["dbm"] = ScpiPlaceholder.Dbm,
        ["points"] = ScpiPlaceholder.Points,
        ["count"] = ScpiPlaceholder.Count,
        ["state"] = ScpiPlaceholder.State,
        ["format"] = ScpiPlaceholder.Format,
        ["order"] = ScpiPlaceholder.Order,
    };

    private readonly int _at;
    private readonly int _length;

    private ScpiCommandTemplate(string text, ScpiPlaceholder? placeholder, int at, int length)
    {
        Text = text;
        Placeholder = placeholder;
        _at = at;
        _length = length;
    }

    /// <summary>The template as written.</summary>
    public string Text { get; }

    /// <summary>The placeholder it holds, or null for a fixed command.</summary>
    public ScpiPlaceholder? Placeholder { get; }

    /// <summary>
    /// Parses <paramref name="text"/> and checks that it holds exactly the placeholder
    /// <paramref name="expected"/> (none when null). Fails on an empty or multi-line template, an
    /// unknown or unclosed placeholder, more than one placeholder, or the wrong one.
    /// </summary>
    public static ParseResult<ScpiCommandTemplate> Parse(string? text, ScpiPlaceholder? expected)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return ParseResult<ScpiCommandTemplate>.Fail("the command is empty");
        }

        if (text.Any(char.IsControl))
        {
            return ParseResult<ScpiCommandTemplate>.Fail(
                $"\"{InstrumentException.Printable(text)}\" holds a line break or control character; a template must be one command on one line");
        }

        ScpiPlaceholder? found = null;
        int at = -1, length = 0;
        for (int i = 0; i < text.Length; i++)
        {
            if (text[i] == '}')
            {
                return ParseResult<ScpiCommandTemplate>.Fail($"\"{text}\" has a '}}' with no '{{' before it");
            }

            if (text[i] != '{')
            {
                continue;
            }

            int close = text.IndexOf('}', i);
            if (close < 0)
            {
                return ParseResult<ScpiCommandTemplate>.Fail($"\"{text}\" has a '{{' with no '}}' after it");
            }

            var name = text[(i + 1)..close];
            if (!Names.TryGetValue(name, out var kind))
            {
                return ParseResult<ScpiCommandTemplate>.Fail(
                    $"\"{text}\" has an unknown placeholder {{{name}}}; known: {string.Join(", ", Names.Keys.Select(k => "{" + k + "}"))}");
            }

            if (found is not null)
            {
                return ParseResult<ScpiCommandTemplate>.Fail($"\"{text}\" has more than one placeholder; a command takes one value");
            }

            found = kind;
            at = i;
            length = close - i + 1;
            i = close;
        }

        if (found != expected)
        {
            return ParseResult<ScpiCommandTemplate>.Fail((expected, found) switch
            {
                (null, _) => $"\"{text}\" takes no value, but has the placeholder {NameOf(found!.Value)}",
                (_, null) => $"\"{text}\" needs the placeholder {NameOf(expected.Value)}",
                _ => $"\"{text}\" needs the placeholder {NameOf(expected.Value)}, not {NameOf(found.Value)}",
            });
        }

        return ParseResult<ScpiCommandTemplate>.Ok(new ScpiCommandTemplate(text, found, at, length));
    }

    /// <summary>The placeholder's name as written in a template, e.g. <c>{hz}</c>.</summary>
    public static string NameOf(ScpiPlaceholder placeholder) =>
        "{" + Names.First(pair => pair.Value == placeholder).Key + "}";

    /// <summary>The command of a template with no placeholder.</summary>
    /// <exception cref="InvalidOperationException">The template has a placeholder.</exception>
    public string Render() =>
        Placeholder is null ? Text : throw new InvalidOperationException($"\"{Text}\" needs a value for {NameOf(Placeholder.Value)}.");

    /// <summary>Fills <c>{hz}</c> with the frequency in hertz.</summary>
    /// <exception cref="InvalidOperationException">The template has another placeholder or none.</exception>
    public string Render(Frequency frequency) => Fill(ScpiPlaceholder.Hz, Number(frequency.Hertz));

    /// <summary>Fills <c>{dbm}</c> with the level in dBm.</summary>
    /// <exception cref="InvalidOperationException">The template has another placeholder or none.</exception>
    public string Render(Level level) => Fill(ScpiPlaceholder.Dbm, Number(level.Dbm));

    /// <summary>Fills <c>{db}</c> with the ratio in decibels.</summary>
    /// <exception cref="InvalidOperationException">The template has another placeholder or none.</exception>
    public string Render(Ratio ratio) => Fill(ScpiPlaceholder.Db, Number(ratio.Decibels));

    /// <summary>Fills <c>{points}</c> or <c>{count}</c>, whichever the template has.</summary>
    /// <exception cref="InvalidOperationException">The template has another placeholder or none.</exception>
    public string Render(int value) =>
        Fill(Placeholder == ScpiPlaceholder.Count ? ScpiPlaceholder.Count : ScpiPlaceholder.Points, value.ToString(CultureInfo.InvariantCulture));

    /// <summary>Fills <c>{state}</c> with <c>ON</c> or <c>OFF</c>.</summary>
    /// <exception cref="InvalidOperationException">The template has another placeholder or none.</exception>
    public string Render(bool on) => Fill(ScpiPlaceholder.State, on ? "ON" : "OFF");

    /// <summary>Fills <c>{format}</c> with <c>ASCii</c>, <c>REAL,32</c> or <c>REAL,64</c>.</summary>
    /// <exception cref="InvalidOperationException">The template has another placeholder or none.</exception>
    public string Render(ScpiDataFormat format) => Fill(ScpiPlaceholder.Format, format switch
    {
        ScpiDataFormat.Ascii => "ASCii",
        ScpiDataFormat.Real32 => "REAL,32",
        ScpiDataFormat.Real64 => "REAL,64",
        _ => throw new ArgumentOutOfRangeException(nameof(format), format, "Unknown data format."),
    });

    /// <summary>Fills <c>{order}</c> with <c>NORMal</c> or <c>SWAPped</c>.</summary>
    /// <exception cref="InvalidOperationException">The template has another placeholder or none.</exception>
    public string Render(ScpiByteOrder order) => Fill(ScpiPlaceholder.Order, order switch
    {
        ScpiByteOrder.Normal => "NORMal",
        ScpiByteOrder.Swapped => "SWAPped",
        _ => throw new ArgumentOutOfRangeException(nameof(order), order, "Unknown byte order."),
    });

    /// <summary>The template as written.</summary>
    public override string ToString() => Text;

    // Shortest text that reads back as the same double; an exponent (1E+21) is valid NR3.
    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private string Fill(ScpiPlaceholder kind, string value)
    {
        if (Placeholder != kind)
        {
            throw new InvalidOperationException(Placeholder is null
                ? $"\"{Text}\" takes no value, but was given one for {NameOf(kind)}."
                : $"\"{Text}\" needs a value for {NameOf(Placeholder.Value)}, not {NameOf(kind)}.");
        }

        return string.Concat(Text.AsSpan(0, _at), value, Text.AsSpan(_at + _length));
    }
}
