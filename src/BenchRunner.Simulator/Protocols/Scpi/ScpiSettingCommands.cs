namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// Declares the usual pair for one setting: the command, taking one value (or <c>MINimum</c>,
/// <c>MAXimum</c>, <c>DEFault</c>), and its query, answering the value (or, given one of those
/// words, the range's value). Values are rounded to the range's step and refused outside it with
/// −222 "Data out of range". A numeric suffix other than 1 is refused with −114.
/// </summary>
public static class ScpiSettingCommands
{
    /// <summary>Declares a numeric setting in <paramref name="unit"/>: <paramref name="header"/> and <paramref name="header"/><c>?</c>.</summary>
    /// <param name="tree">The tree to declare in.</param>
    /// <param name="header">The setting's header, without <c>?</c>, e.g. <c>[SENSe#]:BANDwidth[:RESolution]</c>.</param>
    /// <param name="unit">The unit, which decides the suffixes accepted.</param>
    /// <param name="range">The range in force.</param>
    /// <param name="read">The present value, in the unit's base.</param>
    /// <param name="write">Applies a value within the range; may still refuse with <see cref="ArgumentOutOfRangeException"/>.</param>
    /// <returns>The tree, for chaining.</returns>
    public static ScpiCommandTree NumberSetting(this ScpiCommandTree tree, string header, ScpiUnit unit,
        Func<SettingRange> range, Func<double> read, Action<double> write)
    {
        ArgumentNullException.ThrowIfNull(tree);
        return tree
            .Command(header, c =>
            {
                c.ExpectSuffixesUpTo(1);
                c.ExpectParameters(1, 1);
                var r = range();
                write(Within(r, r.RoundToStep(c.Number(0, unit, r))));
            })
            .Query(header + "?", c => ScpiResponse.Number(Answer(c, range(), read)));
    }

    /// <summary>Declares a whole-number setting without a unit (points, sweeps).</summary>
    /// <inheritdoc cref="NumberSetting" path="/param"/>
    /// <returns>The tree, for chaining.</returns>
    public static ScpiCommandTree IntegerSetting(this ScpiCommandTree tree, string header,
        Func<SettingRange> range, Func<int> read, Action<int> write)
    {
        ArgumentNullException.ThrowIfNull(tree);
        return tree
            .Command(header, c =>
            {
                c.ExpectSuffixesUpTo(1);
                c.ExpectParameters(1, 1);
                var r = range();
                write((int)Within(r, c.Integer(0, r)));
            })
            .Query(header + "?", c => ScpiResponse.Number(Answer(c, range(), () => read())));
    }

    /// <summary>Declares an ON/OFF setting; the query answers 1 or 0.</summary>
    /// <param name="tree">The tree to declare in.</param>
    /// <param name="header">The setting's header, without <c>?</c>, e.g. <c>OUTPut#[:STATe]</c>.</param>
    /// <param name="read">The present state.</param>
    /// <param name="write">Applies a state.</param>
    /// <returns>The tree, for chaining.</returns>
    public static ScpiCommandTree SwitchSetting(this ScpiCommandTree tree, string header, Func<bool> read, Action<bool> write)
    {
        ArgumentNullException.ThrowIfNull(tree);
        return tree
            .Command(header, c =>
            {
                c.ExpectSuffixesUpTo(1);
                c.ExpectParameters(1, 1);
                write(c.Boolean(0));
            })
            .Query(header + "?", c =>
            {
                c.ExpectSuffixesUpTo(1);
                c.ExpectParameters(0, 0);
                return ScpiResponse.Boolean(read());
            });
    }

    /// <summary>Refuses a value outside the range with −222 "Data out of range".</summary>
    internal static double Within(SettingRange range, double value) =>
        range.Contains(value) ? value : throw new ScpiCommandException(ScpiStandardErrors.DataOutOfRange);

    // The query of a setting: its value, or with MIN|MAX|DEF the range's (SCPI-1999 Vol 1 §7.2.1.1, from memory).
    private static double Answer(ScpiCommandContext c, SettingRange range, Func<double> read)
    {
        c.ExpectSuffixesUpTo(1);
        c.ExpectParameters(0, 1);
        return c.Has(0)
            ? c.Choice(0, ("MINimum", range.Minimum), ("MAXimum", range.Maximum), ("DEFault", range.Default))
            : read();
    }
}
