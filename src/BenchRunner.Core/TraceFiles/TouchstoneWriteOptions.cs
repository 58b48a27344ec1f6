namespace BenchRunner.Core.TraceFiles;

/// <summary>
/// How <see cref="TouchstoneWriter"/> writes a file. Defaults: version 1, MHz, RI, the data's own
/// reference resistance, no comments.
/// </summary>
public sealed class TouchstoneWriteOptions
{
    /// <summary>The Touchstone version: 1 (option line and data only) or 2 (2.0 keywords). Default 1.</summary>
    public int Version { get; init; } = 1;

    /// <summary>The unit of the written frequencies. Default MHz.</summary>
    public TouchstoneFrequencyUnit FrequencyUnit { get; init; } = TouchstoneFrequencyUnit.Megahertz;

    /// <summary>How complex values are written. Default RI, which loses nothing.</summary>
    public TouchstoneFormat Format { get; init; } = TouchstoneFormat.RealImaginary;

    /// <summary>
    /// The reference resistance in ohms to write the S-parameters for, the same for every port; the
    /// data are renormalised when theirs differ. Null (the default) keeps the data's own references.
    /// </summary>
    public double? ReferenceOhms { get; init; }

    /// <summary>Comment lines written at the top of the file, each after <c>! </c>. Default none.</summary>
    public IReadOnlyList<string> Comments { get; init; } = [];

    /// <summary>Checks every option and reports all problems together.</summary>
    /// <exception cref="ArgumentException">One or more options are out of range.</exception>
    public void Validate()
    {
        var problems = new List<string>();
        if (Version is not (1 or 2))
        {
            problems.Add($"Version must be 1 or 2, not {Version}.");
        }

        if (!Enum.IsDefined(FrequencyUnit))
        {
            problems.Add($"FrequencyUnit {FrequencyUnit} is not a known unit.");
        }

        if (!Enum.IsDefined(Format))
        {
            problems.Add($"Format {Format} is not a known format.");
        }

        if (ReferenceOhms is { } r && (!double.IsFinite(r) || r <= 0))
        {
            problems.Add($"ReferenceOhms must be finite and positive, not {r}.");
        }

        if (Comments is null)
        {
            problems.Add("Comments must not be null.");
        }
        else if (Comments.Any(c => c is null || c.Contains('\n') || c.Contains('\r')))
        {
            problems.Add("Each comment must be one line of text.");
        }

        if (problems.Count > 0)
        {
            throw new ArgumentException("Invalid Touchstone write options: " + string.Join(" ", problems));
        }
    }
}
