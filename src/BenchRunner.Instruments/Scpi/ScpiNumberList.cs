using System.Collections.Immutable;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Errors;

namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// Parses a comma-separated list of numbers, as a trace comes back under <c>FORMat:DATA ASCii</c>:
/// <c>-20.5,-20.25,1.2E-3</c>. Each item is an NR1, NR2 or NR3 number (see <see cref="ScpiNumber"/>).
/// </summary>
public static class ScpiNumberList
{
    /// <summary>Parses the list; an empty reply or a bad item (named by its position, from 1) is a failure.</summary>
    public static ParseResult<ImmutableArray<double>> Parse(string? reply)
    {
        var text = reply?.Trim() ?? "";
        if (text.Length == 0)
        {
            return ParseResult<ImmutableArray<double>>.Fail("the reply is empty; expected comma-separated numbers");
        }

        var items = text.Split(',');
        var values = ImmutableArray.CreateBuilder<double>(items.Length);
        foreach (var item in items)
        {
            var number = ScpiNumber.Parse(item);
            if (!number.Success)
            {
                return ParseResult<ImmutableArray<double>>.Fail(
                    $"item {values.Count + 1} of {items.Length}, \"{InstrumentException.Printable(item.Trim(), 40)}\", is not a number; expected comma-separated decimal numbers");
            }

            values.Add(number.Value);
        }

        return ParseResult<ImmutableArray<double>>.Ok(values.MoveToImmutable());
    }
}
