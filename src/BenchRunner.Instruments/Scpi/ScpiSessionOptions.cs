namespace BenchRunner.Instruments.Scpi;

/// <summary>How a <see cref="ScpiSession"/> times its replies and checks for errors.</summary>
public sealed class ScpiSessionOptions
{
    /// <summary>The longest any timeout may be: one hour.</summary>
    public static readonly TimeSpan MaxTimeout = TimeSpan.FromHours(1);

    /// <summary>
    /// How long one reply may take, from the command's sending to the reply's last byte: a query's
    /// reply line, a data block, each error-queue entry. It must cover the largest trace over the
    /// slowest link. Default 5 s.
    /// </summary>
    public TimeSpan CommandTimeout { get; init; } = TimeSpan.FromSeconds(5);

    /// <summary>
    /// How long <c>*OPC?</c> may take to answer: a sweep (with averaging) or a <c>*RST</c> can take
    /// many seconds. Also bounds <see cref="ScpiSession.ResetAsync"/>, which may wait for an
    /// unfinished sweep. Default 60 s.
    /// </summary>
    public TimeSpan CompletionTimeout { get; init; } = TimeSpan.FromSeconds(60);

    /// <summary>Whether each operation is followed by draining the error queue. Default true.</summary>
    public bool DrainErrors { get; init; } = true;

    /// <summary>
    /// The most error-queue reads in one drain (1 to 1000); a queue still not empty then is an error,
    /// as the instrument may be repeating an entry for ever. Default 32.
    /// </summary>
    public int MaxErrorReads { get; init; } = 32;

    /// <summary>The query that takes the oldest entry off the error queue. Default <c>SYSTem:ERRor?</c>.</summary>
    public string ErrorQuery { get; init; } = "SYSTem:ERRor?";

    /// <summary>Throws <see cref="ArgumentException"/> naming every invalid setting.</summary>
    public void Validate()
    {
        var problems = new List<string>();
        if (CommandTimeout <= TimeSpan.Zero || CommandTimeout > MaxTimeout) problems.Add("the command timeout must be above 0 and at most 1 hour");
        if (CompletionTimeout <= TimeSpan.Zero || CompletionTimeout > MaxTimeout) problems.Add("the completion timeout must be above 0 and at most 1 hour");
        if (MaxErrorReads is < 1 or > 1000) problems.Add("the maximum number of error-queue reads must be 1 to 1000");
        var error = ScpiCommandTemplate.Parse(ErrorQuery, null);
        if (!error.Success) problems.Add("the error query: " + error.Error);
        else if (!ErrorQuery.Contains('?', StringComparison.Ordinal)) problems.Add($"the error query \"{ErrorQuery}\" must be a query (with '?')");
        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid SCPI session options: " + string.Join("; ", problems) + ".");
        }
    }
}
