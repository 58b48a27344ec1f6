namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>Where a header led: the node that handles it, the node later headers are relative to, and the numeric suffixes met.</summary>
/// <param name="Leaf">The node whose handler runs.</param>
/// <param name="PathAfter">The current path after this header (SCPI-1999 Vol 1 §6.2.4).</param>
/// <param name="Suffixes">One value for each suffix-taking node on the way, in order; 1 where none was written.</param>
internal sealed record ScpiResolution(ScpiNode Leaf, ScpiNode PathAfter, IReadOnlyList<int> Suffixes);
