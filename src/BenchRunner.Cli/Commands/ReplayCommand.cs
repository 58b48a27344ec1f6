using System.CommandLine;
using BenchRunner.Cli.Replay;
using BenchRunner.Instruments.Capture;

namespace BenchRunner.Cli.Commands;

/// <summary>
/// <c>benchrunner replay CAPTURE [--json]</c>: checks that a capture file is well-formed and
/// shows the recorded conversation. Exit 0 when it reads, 2 when it is malformed.
/// </summary>
public static class ReplayCommand
{
    /// <summary>Creates the verb.</summary>
    public static Command Create(CliConsole console)
    {
        var capture = new Argument<string>("CAPTURE") { Description = "A capture file written with --record (see docs/capture-format.md)." };
        var json = CommonOptions.Json();
        var command = new Command("replay", "Check a recorded serial or network session and show it as a readable conversation. Exit code 0 well-formed, 2 malformed.")
        {
            capture, json,
        };
        command.SetAction(parsed =>
        {
            var session = CaptureReader.Read(parsed.GetRequiredValue(capture));
            if (session.IncompleteLine is { } line)
            {
                console.Error.WriteLine($"benchrunner: warning: {session.SourceName}:{line}: the last line is cut off (the recording stopped while writing it); it is left out.");
            }

            if (parsed.GetValue(json))
            {
                CaptureView.WriteJson(session, console.Out);
            }
            else
            {
                CaptureView.WriteText(session, console.Out);
            }

            return ExitCodes.Success;
        });
        return command;
    }
}
