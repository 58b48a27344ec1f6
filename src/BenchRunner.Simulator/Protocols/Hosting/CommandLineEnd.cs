namespace BenchRunner.Simulator.Protocols.Hosting;

/// <summary>Which received bytes end a command line.</summary>
public enum CommandLineEnd
{
    /// <summary>LF ends a line; a CR directly before it is dropped (SCPI, the bench analysers).</summary>
    LineFeed,

    /// <summary>CR or LF ends a line, so CR LF ends one line and an empty one (the bench generator).</summary>
    CarriageReturnOrLineFeed,
}
