namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// What a command handler is given: the header as received, its parameters and numeric suffixes, and
/// readers that turn parameters into values. Every reader refuses a bad parameter by throwing
/// <see cref="ScpiCommandException"/> with the standard error (−109, −108, −104, −131, −138, −222, −224).
/// </summary>
public sealed class ScpiCommandContext
{
    private static readonly ScpiKeyword Minimum = ScpiKeyword.Parse("MINimum");
    private static readonly ScpiKeyword Maximum = ScpiKeyword.Parse("MAXimum");
    private static readonly ScpiKeyword Default = ScpiKeyword.Parse("DEFault");

    internal ScpiCommandContext(string header, bool isQuery, IReadOnlyList<ScpiParameter> parameters, IReadOnlyList<int> suffixes)
    {
        Header = header;
        IsQuery = isQuery;
        Parameters = parameters;
        Suffixes = suffixes;
    }

    /// <summary>The header as received, e.g. <c>sens:freq:star</c>.</summary>
    public string Header { get; }

    /// <summary>True for a query.</summary>
    public bool IsQuery { get; }

    /// <summary>The parameters as received.</summary>
    public IReadOnlyList<ScpiParameter> Parameters { get; }

    /// <summary>The numeric suffix of each <c>#</c> node on the way to the handler, in order; 1 where none was written.</summary>
    public IReadOnlyList<int> Suffixes { get; }

    /// <summary>Refuses fewer than <paramref name="minimum"/> parameters (−109) or more than <paramref name="maximum"/> (−108).</summary>
    public void ExpectParameters(int minimum, int maximum)
    {
        if (Parameters.Count < minimum)
        {
            throw new ScpiCommandException(ScpiStandardErrors.MissingParameter, Header);
        }

        if (Parameters.Count > maximum)
        {
            throw new ScpiCommandException(ScpiStandardErrors.ParameterNotAllowed, Header);
        }
    }

    /// <summary>Refuses a numeric suffix above <paramref name="highest"/> (−114); the simulated instruments have one window, trace, input and output.</summary>
    public void ExpectSuffixesUpTo(int highest)
    {
        if (Suffixes.Any(s => s < 1 || s > highest))
        {
            throw new ScpiCommandException(ScpiStandardErrors.HeaderSuffixOutOfRange, Header);
        }
    }

    /// <summary>
    /// The number at <paramref name="index"/> in the unit's base (hertz, dB, dBm), its suffix applied;
    /// <c>MINimum</c>, <c>MAXimum</c> and <c>DEFault</c> give the range's values.
    /// </summary>
    /// <param name="index">The parameter's position, from 0.</param>
    /// <param name="unit">The unit, which decides the suffixes allowed.</param>
    /// <param name="range">The setting's range, for MIN, MAX and DEF; null when they are not allowed.</param>
    public double Number(int index, ScpiUnit unit, SettingRange? range = null)
    {
        var parameter = Parameter(index);
        switch (parameter.Kind)
        {
            case ScpiParameterKind.Character when range is { } r && Minimum.Matches(parameter.Word):
                return r.Minimum;
            case ScpiParameterKind.Character when range is { } r && Maximum.Matches(parameter.Word):
                return r.Maximum;
            case ScpiParameterKind.Character when range is { } r && Default.Matches(parameter.Word):
                return r.Default;
            case ScpiParameterKind.Numeric:
                if (parameter.Suffix is not { } suffix)
                {
                    return parameter.Number;
                }

                if (unit == ScpiUnit.None)
                {
                    throw new ScpiCommandException(ScpiStandardErrors.SuffixNotAllowed, $"{Header} {parameter.Text}");
                }

                var factor = ScpiSuffixes.Multiplier(unit, suffix)
                    ?? throw new ScpiCommandException(ScpiStandardErrors.InvalidSuffix, $"{Header} {parameter.Text}");
                return parameter.Number * factor;
            default:
                throw new ScpiCommandException(ScpiStandardErrors.DataTypeError, $"{Header} {parameter.Text}: a number is needed");
        }
    }

    /// <summary>A whole number (the value rounded, halves away from zero), with <c>MINimum|MAXimum|DEFault</c> as for <see cref="Number"/>; no suffix.</summary>
    public int Integer(int index, SettingRange? range = null)
    {
        var rounded = Math.Round(Number(index, ScpiUnit.None, range), MidpointRounding.AwayFromZero);
        return rounded is >= int.MinValue and <= int.MaxValue
            ? (int)rounded
            : throw new ScpiCommandException(ScpiStandardErrors.DataOutOfRange, Header);
    }

    /// <summary>A switch: <c>ON</c> or <c>OFF</c>, or a number (on unless it rounds to 0), IEEE 488.2 §7.7.1 boolean data.</summary>
    public bool Boolean(int index)
    {
        var parameter = Parameter(index);
        return parameter.Kind switch
        {
            ScpiParameterKind.Character when parameter.Word == "ON" => true,
            ScpiParameterKind.Character when parameter.Word == "OFF" => false,
            ScpiParameterKind.Character => throw new ScpiCommandException(ScpiStandardErrors.IllegalParameterValue, $"{Header} {parameter.Text}: ON or OFF is needed"),
            ScpiParameterKind.Numeric when parameter.Suffix is not null => throw new ScpiCommandException(ScpiStandardErrors.SuffixNotAllowed, $"{Header} {parameter.Text}"),
            ScpiParameterKind.Numeric => Math.Round(parameter.Number, MidpointRounding.AwayFromZero) != 0,
            _ => throw new ScpiCommandException(ScpiStandardErrors.DataTypeError, $"{Header} {parameter.Text}: ON or OFF is needed"),
        };
    }

    /// <summary>The value of the word at <paramref name="index"/>, matched against each choice's short and long form (<c>SWAPped</c>).</summary>
    public T Choice<T>(int index, params (string Keyword, T Value)[] choices)
    {
        var parameter = Parameter(index);
        var names = string.Join("|", choices.Select(c => c.Keyword));
        if (parameter.Kind != ScpiParameterKind.Character)
        {
            throw new ScpiCommandException(ScpiStandardErrors.DataTypeError, $"{Header} {parameter.Text}: one of {names} is needed");
        }

        foreach (var (keyword, value) in choices)
        {
            if (ScpiKeyword.Parse(keyword).Matches(parameter.Word))
            {
                return value;
            }
        }

        throw new ScpiCommandException(ScpiStandardErrors.IllegalParameterValue, $"{Header} {parameter.Text}: one of {names} is needed");
    }

    /// <summary>True when parameter <paramref name="index"/> is present.</summary>
    public bool Has(int index) => index < Parameters.Count;

    private ScpiParameter Parameter(int index) =>
        index < Parameters.Count ? Parameters[index] : throw new ScpiCommandException(ScpiStandardErrors.MissingParameter, Header);
}
