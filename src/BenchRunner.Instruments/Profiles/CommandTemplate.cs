using System.Globalization;
using System.Text;

namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// A command of a driver profile with typed placeholders, e.g. <c>band {start:hz} {stop:hz} {points}</c>.
/// Built only by the profile reader, which has checked every name and type; <c>{{</c> and
/// <c>}}</c> stand for literal braces.
/// </summary>
public sealed class CommandTemplate
{
    private readonly IReadOnlyList<object> _parts;
    private readonly BoolWords _words;

    internal CommandTemplate(string text, IReadOnlyList<object> parts, BoolWords words)
    {
        Text = text;
        _parts = parts;
        _words = words;
        Placeholders = parts.OfType<Placeholder>().ToList();
    }

    /// <summary>The template as written in the profile.</summary>
    public string Text { get; }

    /// <summary>The placeholders in the order they appear.</summary>
    public IReadOnlyList<Placeholder> Placeholders { get; }

    /// <summary>True when the template has a placeholder named <paramref name="name"/>.</summary>
    public bool Uses(string name) => Placeholders.Any(p => p.Name == name);

    /// <summary>
    /// The command with every placeholder replaced by its value written as its type says
    /// (numbers in the invariant culture, trailing zeros dropped, see <see cref="PlaceholderType"/>).
    /// </summary>
    /// <exception cref="ArgumentException">A value is missing or of another kind than the placeholder's.</exception>
    public string Render(TemplateArguments arguments)
    {
        ArgumentNullException.ThrowIfNull(arguments);
        var builder = new StringBuilder();
        foreach (var part in _parts)
        {
            if (part is string literal)
            {
                builder.Append(literal);
                continue;
            }

            var placeholder = (Placeholder)part;
            if (!arguments.TryGet(placeholder.Name, out var value))
            {
                throw new ArgumentException($"No value was given for {{{placeholder.Name}}} of the command \"{Text}\".", nameof(arguments));
            }

            builder.Append(Format(placeholder, value.Kind, value.Number));
        }

        return builder.ToString();
    }

    /// <summary>The template as written.</summary>
    public override string ToString() => Text;

    private string Format(Placeholder placeholder, TemplateValueKind kind, double number)
    {
        var expected = placeholder.Type switch
        {
            PlaceholderType.Hz or PlaceholderType.Khz or PlaceholderType.Mhz or PlaceholderType.Ghz => TemplateValueKind.Frequency,
            PlaceholderType.Dbm => TemplateValueKind.Level,
            PlaceholderType.Db => TemplateValueKind.Ratio,
            PlaceholderType.Int => TemplateValueKind.Count,
            _ => TemplateValueKind.Switch,
        };
        if (kind != expected)
        {
            throw new ArgumentException($"{{{placeholder.Name}}} of the command \"{Text}\" needs {expected.ToString().ToLowerInvariant()}, not {kind.ToString().ToLowerInvariant()}.");
        }

        return placeholder.Type switch
        {
            PlaceholderType.Hz => Math.Round(number, MidpointRounding.AwayFromZero).ToString("0", CultureInfo.InvariantCulture),
            PlaceholderType.Khz => Decimal(number / 1e3, 3),
            PlaceholderType.Mhz => Decimal(number / 1e6, 6),
            PlaceholderType.Ghz => Decimal(number / 1e9, 9),
            PlaceholderType.Dbm or PlaceholderType.Db => Decimal(number, 3),
            PlaceholderType.Int => ((long)number).ToString(CultureInfo.InvariantCulture),
            _ => number != 0 ? _words.True : _words.False,
        };
    }

    // Rounding first keeps binary noise (137.50000000000003) out; adding zero turns -0 into 0.
    private static string Decimal(double value, int decimals) =>
        (Math.Round(value, decimals, MidpointRounding.AwayFromZero) + 0.0)
            .ToString("0." + new string('#', decimals), CultureInfo.InvariantCulture);
}
