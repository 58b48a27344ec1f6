namespace BenchRunner.Storage;

/// <summary>
/// An instrument used by a run, as it identified itself; given to <see cref="IResultWriter.AddInstrumentAsync"/>.
/// The store keeps the text as given and knows nothing of instrument protocols.
/// </summary>
/// <param name="Role">The name the plan gives the instrument (e.g. <c>vna</c>); one per role in a run.</param>
/// <param name="Kind">What it is (e.g. <c>network_analyser</c>).</param>
/// <param name="Maker">Manufacturer, as reported.</param>
/// <param name="Model">Model, as reported.</param>
/// <param name="Serial">Serial number, as reported.</param>
/// <param name="Firmware">Firmware level, as reported.</param>
public sealed record InstrumentRecord(string Role, string Kind, string Maker, string Model, string Serial, string Firmware)
{
    /// <summary>How it was reached (port and speed, address), for the record.</summary>
    public string? Connection { get; init; }

    /// <summary>Cable or fixture compensation in force, as a JSON document.</summary>
    public string? CompensationJson { get; init; }
}
