using System.CommandLine;
using System.Text.Json.Nodes;
using BenchRunner.Cli.Ports;

namespace BenchRunner.Cli.Commands;

/// <summary><c>benchrunner ports [--json]</c>: the serial ports present, with their stable aliases.</summary>
public static class PortsCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var json = CommonOptions.Json();
        var command = new Command("ports", "List the serial ports present on this computer (pseudo-terminals are not listed).") { json };
        command.SetAction(parsed =>
        {
            var ports = SerialPortListing.List();
            if (parsed.GetValue(json))
            {
                var array = new JsonArray();
                foreach (var port in ports)
                {
                    array.Add(new JsonObject
                    {
                        ["path"] = port.Path,
                        ["aliases"] = new JsonArray(port.Aliases.Select(a => (JsonNode?)JsonValue.Create(a)).ToArray()),
                    });
                }

                console.Out.WriteLine(new JsonObject { ["ports"] = array }.ToJsonString());
                return ExitCodes.Success;
            }

            if (ports.Count == 0)
            {
                console.Out.WriteLine("No serial ports found. (A USB instrument may need its cable, its driver, or membership of the dialout group.)");
                return ExitCodes.Success;
            }

            foreach (var port in ports)
            {
                console.Out.WriteLine(port.Aliases.Count == 0 ? port.Path : $"{port.Path}  ({string.Join(", ", port.Aliases)})");
            }

            return ExitCodes.Success;
        });
        return command;
    }
}
