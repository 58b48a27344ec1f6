namespace BenchRunner.Storage;

/// <summary>A check as the file holds it.</summary>
/// <param name="Id">The check's id.</param>
/// <param name="RunId">The run it belongs to.</param>
/// <param name="Record">The check.</param>
public sealed record StoredCheck(long Id, long RunId, CheckRecord Record);
