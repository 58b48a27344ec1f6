using BenchRunner.Cli.Output;
using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Cli.Identify;

/// <summary>Connects to one instrument, asks who it is and what it can do, and disconnects.</summary>
public static class InstrumentProbe
{
    /// <summary>Identifies the instrument at <paramref name="connectionText"/>.</summary>
    /// <exception cref="UsageException">The connection text is malformed, or the capture file exists.</exception>
    /// <exception cref="InputFormatException">The profile is malformed.</exception>
    /// <exception cref="Instruments.Errors.InstrumentException">The instrument cannot be reached or does not answer.</exception>
    public static async Task<IdentifyOutcome> RunAsync(string connectionText, string? profilePath, string? recordPath,
        TransportFactory transports, CancellationToken cancellationToken)
    {
        var parsed = ConnectionSpec.Parse(connectionText);
        if (!parsed.Success)
        {
            throw new UsageException($"\"{connectionText}\" is not a connection: {parsed.Error}. See docs/connections.md.");
        }

        var profile = profilePath is null ? null : DriverProfile.Load(profilePath);
        if (recordPath is not null && File.Exists(recordPath))
        {
            throw new UsageException($"{recordPath} exists already; choose a new capture file name (a recording is never overwritten).");
        }

        await using var instrument = InstrumentAdapterFactory.Create("instrument", profile, parsed.Value, transports, recordPath);
        await instrument.ConnectAsync(cancellationToken).ConfigureAwait(false);
        var capabilities = InstrumentKindRegistry.BuiltIn.Kinds.Where(k => k.IsOfferedBy(instrument)).Select(k => k.Name).ToList();
        return new IdentifyOutcome(connectionText, profile?.Name, instrument.Identity, capabilities, instrument.Limits, recordPath);
    }

    /// <summary>The declared limits in one line, e.g. <c>100 kHz to 1.5 GHz; input at most +10 dBm</c>.</summary>
    public static string DescribeLimits(InstrumentLimits limits)
    {
        var parts = new List<string>();
        if (limits.FrequencyRange is { } range) parts.Add($"{QuantityFormat.Format(range.Start.Hertz, QuantityUnit.Hertz)} to {QuantityFormat.Format(range.Stop.Hertz, QuantityUnit.Hertz)}");
        if (limits.MaxInputLevel is { } input) parts.Add($"input at most {QuantityFormat.Signed(input.Dbm, QuantityUnit.DecibelMilliwatt)}");
        if (limits.MaxOutputLevel is { } output) parts.Add($"output at most {QuantityFormat.Signed(output.Dbm, QuantityUnit.DecibelMilliwatt)}");
        if (limits.MinOutputLevel is { } min) parts.Add($"output at least {QuantityFormat.Signed(min.Dbm, QuantityUnit.DecibelMilliwatt)}");
        return parts.Count == 0 ? "none declared" : string.Join("; ", parts);
    }
}
