namespace BenchRunner.Execution.LimitRecords;

/// <summary>A mask check of a plan, as recorded with a run so that reports can draw it without the mask file.</summary>
/// <param name="Step">The check's step name (or its word when unnamed).</param>
/// <param name="Trace">The name of the trace it judges.</param>
/// <param name="MaskText">The mask in the project's mask file format (docs/mask-format.md).</param>
public sealed record RecordedMask(string Step, string Trace, string MaskText);
