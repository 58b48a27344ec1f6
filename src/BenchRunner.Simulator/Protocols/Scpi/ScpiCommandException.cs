using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// Thrown by the parser or by a command handler to refuse a program message unit; the server puts
/// <see cref="Error"/> on the error queue instead of running the unit, and the exception goes no further.
/// </summary>
public sealed class ScpiCommandException : Exception
{
    /// <summary>Creates the refusal.</summary>
    /// <param name="error">The standard entry, e.g. <see cref="ScpiStandardErrors.DataOutOfRange"/>.</param>
    /// <param name="detail">Device-dependent information for the entry's text, or null to name the header.</param>
    public ScpiCommandException(ScpiError error, string? detail = null)
        : base(detail is null ? error.Text : $"{error.Text}: {detail}")
    {
        Error = error;
        Detail = detail;
    }

    /// <summary>The error-queue entry.</summary>
    public ScpiError Error { get; }

    /// <summary>Device-dependent information appended to the entry's text, or null.</summary>
    public string? Detail { get; }
}
