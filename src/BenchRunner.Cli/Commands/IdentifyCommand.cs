using System.CommandLine;
using System.Text.Json.Nodes;
using BenchRunner.Cli.Identify;
using BenchRunner.Instruments.Connections;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner identify CONNECTION [--profile FILE] [--record FILE] [--json]</c>: connects,
/// reads the instrument's identity and what the adapter can do with it, and disconnects.
/// Nothing is set on the instrument beyond what its profile's connection steps say.
/// </summary>
public static class IdentifyCommand
{
    /// <summary>Creates the verb; <paramref name="transports"/> knows the connection kinds available.</summary>
    public static Command Create(CliConsole console, Func<TransportFactory> transports)
    {
        var connection = new Argument<string>("CONNECTION")
        {
            Description = "Where the instrument is, e.g. serial:/dev/ttyUSB0?baud=115200, tcp:127.0.0.1:5025, replay:session.capture, or the virtual bench sim:vna, sim:sa, sim:gen (docs/connections.md).",
        };
        var profile = new Option<string?>("--profile")
        {
            Description = "A driver profile (docs/profile-format.md). Without one, the instrument is asked *IDN? as a SCPI instrument.",
            HelpName = "FILE",
        };
        var record = new Option<string?>("--record")
        {
            Description = "Record every byte of the session to this new capture file (docs/capture-format.md); replay it later with replay:FILE.",
            HelpName = "FILE",
        };
        var json = CommonOptions.Json();
        var command = new Command("identify", "Connect to an instrument, show who it says it is and what BenchRunner can do with it. Exit code 0 identified, 2 bad input, 3 no answer.")
        {
            connection, profile, record, json,
        };
        command.SetAction(async (parsed, cancellationToken) =>
        {
            var outcome = await InstrumentProbe.RunAsync(parsed.GetRequiredValue(connection), parsed.GetValue(profile), parsed.GetValue(record),
                transports(), cancellationToken).ConfigureAwait(false);
            if (parsed.GetValue(json))
            {
                WriteJson(outcome, console.Out);
            }
            else
            {
                WriteText(outcome, console.Out);
            }

            return ExitCodes.Success;
        });
        return command;
    }

    private static void WriteText(IdentifyOutcome outcome, TextWriter writer)
    {
        writer.WriteLine($"Connection    {outcome.Connection}{(outcome.Profile is null ? "" : $" (profile {outcome.Profile})")}");
        writer.WriteLine($"Maker         {outcome.Identity.Maker}");
        writer.WriteLine($"Model         {outcome.Identity.Model}");
        writer.WriteLine($"Serial        {outcome.Identity.Serial}");
        writer.WriteLine($"Firmware      {outcome.Identity.Firmware}");
        writer.WriteLine($"Capabilities  {(outcome.Capabilities.Count == 0 ? "identification only (give --profile to measure with it)" : string.Join(", ", outcome.Capabilities))}");
        writer.WriteLine($"Limits        {InstrumentProbe.DescribeLimits(outcome.Limits)}");
        if (outcome.RecordedTo is not null)
        {
            writer.WriteLine($"Recorded to   {outcome.RecordedTo}");
        }
    }

    private static void WriteJson(IdentifyOutcome outcome, TextWriter writer)
    {
        var limits = outcome.Limits;
        var document = new JsonObject
        {
            ["connection"] = outcome.Connection,
            ["profile"] = outcome.Profile,
            ["maker"] = outcome.Identity.Maker,
            ["model"] = outcome.Identity.Model,
            ["serial"] = outcome.Identity.Serial,
            ["firmware"] = outcome.Identity.Firmware,
            ["capabilities"] = new JsonArray(outcome.Capabilities.Select(c => (JsonNode?)JsonValue.Create(c)).ToArray()),
            ["limits"] = new JsonObject
            {
                ["lowest_hz"] = limits.FrequencyRange?.Start.Hertz,
                ["highest_hz"] = limits.FrequencyRange?.Stop.Hertz,
                ["max_input_dbm"] = limits.MaxInputLevel?.Dbm,
                ["max_output_dbm"] = limits.MaxOutputLevel?.Dbm,
                ["min_output_dbm"] = limits.MinOutputLevel?.Dbm,
            },
            ["recorded_to"] = outcome.RecordedTo,
        };
        writer.WriteLine(document.ToJsonString(new System.Text.Json.JsonSerializerOptions { WriteIndented = true }));
    }
}
