namespace BenchRunner.Storage.Schema;

/// <summary>One step of the schema: the SQL that takes a file from <c>Version - 1</c> to <paramref name="Version"/>.</summary>
/// <param name="Version">The schema version after this step, from 1 up with no gaps.</param>
/// <param name="Name">A short description, from the file name (<c>0001-initial.sql</c> gives <c>initial</c>).</param>
/// <param name="Sql">The statements, run in one transaction.</param>
internal sealed record Migration(int Version, string Name, string Sql);
