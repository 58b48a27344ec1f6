namespace BenchRunner.Storage;

/// <summary>A sweep as the file holds it; its trace is rebuilt bit for bit from the stored BLOBs.</summary>
/// <param name="Id">The sweep's id.</param>
/// <param name="RunId">The run it belongs to.</param>
/// <param name="Sequence">Its place in the run: 1 for the first sweep stored, then 2, 3...</param>
/// <param name="Record">The sweep with its figures; <see cref="SweepRecord.AcquiredUtc"/> is always set (UTC, whole milliseconds).</param>
public sealed record StoredSweep(long Id, long RunId, int Sequence, SweepRecord Record);
