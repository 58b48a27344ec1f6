using BenchRunner.Core.Traces;

namespace BenchRunner.Cli.Export;

/// <summary>One file an export will write.</summary>
/// <param name="FileName">The file's name, without folder.</param>
/// <param name="Set">The traces it holds.</param>
/// <param name="IsTouchstone">True for a Touchstone file, false for CSV.</param>
/// <param name="Sequences">The stored sweeps' sequence numbers it holds, in order.</param>
/// <param name="Note">Why the file is not what the format asked for, or null.</param>
public sealed record ExportFile(string FileName, TraceSet Set, bool IsTouchstone, IReadOnlyList<int> Sequences, string? Note);
