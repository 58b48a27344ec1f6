namespace BenchRunner.Execution.Batch;

/// <summary>
/// What counts as a board serial: what a person types or a barcode scanner sends, trimmed; 1 to
/// <see cref="MaxLength"/> printable characters without spaces.
/// </summary>
public static class BoardSerial
{
    /// <summary>The longest serial accepted.</summary>
    public const int MaxLength = 64;

    /// <summary>Trims <paramref name="text"/> and checks it is a serial.</summary>
    /// <param name="text">A line as typed or scanned.</param>
    /// <param name="serial">The serial, trimmed; null when it is not one.</param>
    /// <param name="problem">What is wrong with it, for the operator; null when it is a serial.</param>
    public static bool TryRead(string? text, out string? serial, out string? problem)
    {
        serial = null;
        var trimmed = text?.Trim() ?? "";
        problem = trimmed.Length == 0 ? "a serial cannot be empty"
            : trimmed.Length > MaxLength ? $"a serial has at most {MaxLength} characters; \"{trimmed[..20]}...\" has {trimmed.Length}"
            : trimmed.Any(char.IsWhiteSpace) ? $"a serial has no spaces: \"{trimmed}\""
            : trimmed.Any(char.IsControl) ? "a serial has only printable characters (was a control key scanned?)"
            : null;
        if (problem is null)
        {
            serial = trimmed;
        }

        return problem is null;
    }
}
