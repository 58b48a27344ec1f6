using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Generator;

/// <summary>The properties of a simulated signal generator. Validated when the generator is built, every problem reported at once.</summary>
public sealed class SignalGeneratorOptions
{
    /// <summary>
    /// The harmonics it puts out with the carrier; default 2nd at −30 dBc and 3rd at −40 dBc
    /// (invented; typical of a generator without output filter, common practice, no source).
    /// Empty for a clean carrier. Each order at most once.
    /// </summary>
    public IReadOnlyList<GeneratorHarmonic> Harmonics { get; init; } =
        [GeneratorHarmonic.Of(2, Ratio.FromDecibels(-30)), GeneratorHarmonic.Of(3, Ratio.FromDecibels(-40))];

    /// <summary>The serial number reported in the identity; default <c>0001</c>.</summary>
    public string Serial { get; init; } = "0001";

    /// <summary>Throws when any option is invalid, naming all of them.</summary>
    /// <exception cref="ArgumentException">One or more options are invalid.</exception>
    internal void Validate()
    {
        var problems = new List<string>();
        if (Harmonics is null)
        {
            problems.Add("the harmonics list must not be null (leave it empty for a clean carrier)");
        }
        else
        {
            var repeated = Harmonics.GroupBy(h => h.Order).Where(g => g.Count() > 1).Select(g => g.Key).ToList();
            if (Harmonics.Any(h => h.Order < 2))
            {
                problems.Add("every harmonic needs an order of 2 or more (use GeneratorHarmonic.Of)");
            }

            if (repeated.Count > 0)
            {
                problems.Add($"harmonic order {string.Join(", ", repeated)} is given more than once");
            }
        }

        if (string.IsNullOrWhiteSpace(Serial) || Serial.Contains(','))
        {
            problems.Add("the serial number must be non-empty and hold no comma");
        }

        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid signal generator options: " + string.Join("; ", problems) + ".");
        }
    }
}
