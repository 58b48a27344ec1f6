namespace BenchRunner.Instruments.Tests.Profiles;

/// <summary>Small profiles for tests, built line by line so that line numbers are plain to see.</summary>
internal static class ProfileText
{
    /// <summary>A minimal valid network analyser profile; line numbers are fixed (1 to 8).</summary>
    public static readonly string[] MinimalVna =
    [
        "profile: t",                                        // 1
        "kinds: [network-analyser]",                         // 2
        "identity: {maker: workshop, model: test}",          // 3
        "network-analyser:",                                 // 4
        "  setup: band {start:hz} {stop:hz} {points}",       // 5
        "  read: {S21: data s21}",                           // 6
        "  data:",                                           // 7
        "    columns: [freq-hz, re, im]",                    // 8
    ];

    public static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";

    /// <summary>The minimal profile with line <paramref name="number"/> (1-based) replaced.</summary>
    public static string Replace(int number, string line)
    {
        var lines = MinimalVna.ToArray();
        lines[number - 1] = line;
        return Lines(lines);
    }

    /// <summary>The minimal profile with <paramref name="extra"/> lines added at the end.</summary>
    public static string With(params string[] extra) => Lines([.. MinimalVna, .. extra]);

    /// <summary>The minimal profile with a data section of its own (lines 7 on).</summary>
    public static string WithData(params string[] dataLines) => Lines([.. MinimalVna[..6], "  data:", .. dataLines.Select(l => "    " + l)]);
}
