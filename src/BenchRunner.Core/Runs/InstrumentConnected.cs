namespace BenchRunner.Core.Runs;

/// <summary>An instrument of the run answered and identified itself.</summary>
/// <param name="At">When.</param>
/// <param name="Role">Its role in the plan and bench.</param>
/// <param name="Kind">Its kind's word, e.g. <c>network-analyser</c>.</param>
/// <param name="Maker">The maker it reported.</param>
/// <param name="Model">The model it reported.</param>
/// <param name="Serial">The serial number it reported.</param>
/// <param name="Firmware">The firmware version it reported.</param>
public sealed record InstrumentConnected(DateTimeOffset At, string Role, string Kind, string Maker, string Model, string Serial, string Firmware)
    : RunEvent(At)
{
    /// <summary>How it is reached, e.g. <c>tcp:127.0.0.1:5025</c>.</summary>
    public string? Connection { get; init; }

    /// <summary>The input compensation declared for it on the bench, as JSON, or null.</summary>
    public string? CompensationJson { get; init; }
}
