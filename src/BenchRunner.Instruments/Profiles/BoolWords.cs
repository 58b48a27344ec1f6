namespace BenchRunner.Instruments.Profiles;

/// <summary>The two words a profile writes for a switch placeholder (<c>bool-words</c>).</summary>
/// <param name="True">The word for on / true; <c>on</c> by default.</param>
/// <param name="False">The word for off / false; <c>off</c> by default.</param>
public sealed record BoolWords(string True, string False)
{
    /// <summary><c>on</c> and <c>off</c>.</summary>
    public static BoolWords Default { get; } = new("on", "off");
}
