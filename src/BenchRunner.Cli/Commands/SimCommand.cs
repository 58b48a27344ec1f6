using System.CommandLine;
using System.Text.Json.Nodes;
using BenchRunner.Cli.Sim;
using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Endpoints;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner sim [--tcp PORT] [--pty] [--seed N] [--duration TIME]</c>: serves the virtual
/// bench (network analyser, spectrum analyser, signal generator; SCPI and the raw dialect) on
/// loopback TCP ports and/or pseudo-terminals, prints where each listens, and runs until
/// Ctrl+C (or for the given duration).
/// </summary>
public static class SimCommand
{
    /// <summary>The first TCP port when none is given: the port SCPI instruments on a LAN commonly use (common practice, no source).</summary>
    public const int DefaultBasePort = 5025;

    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var tcp = new Option<int?>("--tcp")
        {
            Description = $"Serve on loopback TCP ports from PORT up (vna, sa, gen in SCPI, then in the raw dialect: PORT..PORT+5; 0 = any free ports). Default {DefaultBasePort} when --pty is not given.",
            HelpName = "PORT",
        };
        var pty = new Option<bool>("--pty") { Description = "Serve each instrument on a pseudo-terminal too, as if it were a serial device (Linux)." };
        var seed = new Option<int>("--seed") { Description = "Seeds the simulated noise; the same seed gives the same traces. Default 1.", DefaultValueFactory = _ => 1 };
        var duration = new Option<string?>("--duration")
        {
            Description = "Stop by itself after this long (e.g. 10 min); without it, run until Ctrl+C.",
            HelpName = "TIME",
        };
        var json = CommonOptions.Json();
        var command = new Command("sim", "Serve the virtual bench's instruments so that any program can talk to them; prints where each listens.")
        {
            tcp, pty, seed, duration, json,
        };
        command.SetAction(async (parsed, cancellationToken) =>
        {
            TimeSpan? runFor = null;
            if (parsed.GetValue(duration) is { } text)
            {
                var length = DurationText.Parse(text);
                runFor = length.Success ? length.Value : throw new UsageException($"--duration: {length.Error}");
            }

            bool usePty = parsed.GetValue(pty);
            int? basePort = parsed.GetValue(tcp) ?? (usePty ? null : DefaultBasePort);
            await using var session = await SimulatorSession.StartAsync(parsed.GetValue(seed), basePort, usePty, cancellationToken).ConfigureAwait(false);
            if (parsed.GetValue(json))
            {
                WriteJson(session, console.Out);
            }
            else
            {
                WriteText(session, parsed.GetValue(seed), runFor, console.Out);
            }

            console.Out.Flush();
            try
            {
                await Task.Delay(runFor ?? Timeout.InfiniteTimeSpan, cancellationToken).ConfigureAwait(false);
            }
            catch (OperationCanceledException)
            {
                console.Error.WriteLine("benchrunner: the virtual bench has stopped.");
            }

            return ExitCodes.Success;
        });
        return command;
    }

    private static void WriteText(SimulatorSession session, int seed, TimeSpan? runFor, TextWriter writer)
    {
        writer.WriteLine($"Virtual bench, seed {seed}: the demo preselector PSF-24-0001 on the network analyser, the generator wired to the spectrum analyser through a 1 dB cable.");
        writer.WriteLine();
        writer.WriteLine("  instrument  dialect  connection                  driver profile");
        foreach (var e in session.Endpoints)
        {
            writer.WriteLine($"  {VirtualBenchServers.NameOf(e.Instrument),-10}  {e.Dialect.ToString().ToLowerInvariant(),-7}  {e.Connection,-26}  {e.ExampleProfile}");
        }

        writer.WriteLine();
        var first = session.Endpoints[0];
        writer.WriteLine($"Try: benchrunner identify {first.Connection} --profile {first.ExampleProfile}");
        writer.WriteLine(runFor is { } t ? $"Serving for {DurationText.Format(t)}; Ctrl+C stops it sooner." : "Serving until Ctrl+C.");
    }

    private static void WriteJson(SimulatorSession session, TextWriter writer)
    {
        var endpoints = new JsonArray();
        foreach (var e in session.Endpoints)
        {
            endpoints.Add(new JsonObject
            {
                ["instrument"] = VirtualBenchServers.NameOf(e.Instrument),
                ["dialect"] = e.Dialect.ToString().ToLowerInvariant(),
                ["connection"] = e.Connection,
                ["profile"] = e.ExampleProfile,
            });
        }

        writer.WriteLine(new JsonObject { ["endpoints"] = endpoints }.ToJsonString());
    }
}
