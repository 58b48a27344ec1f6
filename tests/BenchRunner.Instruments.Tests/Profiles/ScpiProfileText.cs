namespace BenchRunner.Instruments.Tests.Profiles;

/// <summary>Small scpi profiles for tests, built line by line so that line numbers are plain to see.</summary>
internal static class ScpiProfileText
{
    /// <summary>A minimal valid scpi network analyser profile: lines 1 to 3; added lines start at 4.</summary>
    public static readonly string[] MinimalVna =
    [
        "profile: t",                      // 1
        "adapter: scpi",                   // 2
        "kinds: [network-analyser]",       // 3
    ];

    /// <summary>The minimal profile with <paramref name="extra"/> lines from line 4 on.</summary>
    public static string With(params string[] extra) => ProfileText.Lines([.. MinimalVna, .. extra]);

    /// <summary>A minimal profile of <paramref name="kind"/> with <paramref name="extra"/> lines from line 4 on.</summary>
    public static string Of(string kind, params string[] extra) => ProfileText.Lines(["profile: t", "adapter: scpi", $"kinds: [{kind}]", .. extra]);
}
