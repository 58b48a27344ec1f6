namespace BenchRunner.Simulator.Circuits;

/// <summary>The argument check shared by series and parallel combinations.</summary>
internal static class Combinations
{
    public static T[] Check<T>(IEnumerable<T> parts, string paramName) where T : class
    {
        ArgumentNullException.ThrowIfNull(parts, paramName);
        var array = parts.ToArray();
        if (array.Length == 0)
        {
            throw new ArgumentException("At least one part is needed.", paramName);
        }

        if (Array.IndexOf(array, null) is var i && i >= 0)
        {
            throw new ArgumentException($"Part {i} is null.", paramName);
        }

        return array;
    }
}
