using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Cli.Identify;

/// <summary>What <c>identify</c> found out about an instrument.</summary>
/// <param name="Connection">The connection as given.</param>
/// <param name="Profile">The driver profile's name, or null for plain SCPI identification.</param>
/// <param name="Identity">Maker, model, serial and firmware as the instrument reported them.</param>
/// <param name="Capabilities">What the adapter can do with it (e.g. "network analyser").</param>
/// <param name="Limits">The declared limits.</param>
/// <param name="RecordedTo">The capture file written, if any.</param>
public sealed record IdentifyOutcome(
    string Connection,
    string? Profile,
    InstrumentIdentity Identity,
    IReadOnlyList<string> Capabilities,
    InstrumentLimits Limits,
    string? RecordedTo);
