using System.Globalization;
using Microsoft.Data.Sqlite;

namespace BenchRunner.Storage.Schema;

/// <summary>
/// Brings a file up to the newest schema. The version lives in <c>PRAGMA user_version</c>; the
/// file is marked as a BenchRunner result file by <c>PRAGMA application_id</c>. Each migration
/// runs in its own write transaction together with the version bump, so a failed step leaves the
/// file at the previous version.
/// </summary>
internal static class SchemaMigrator
{
    /// <summary>The application id of a result file: the bytes "BRst" read as a big-endian integer.</summary>
    public const int ApplicationId = 0x42527374;

    /// <summary>The schema version of the file (0 for a new, empty one).</summary>
    public static int CurrentVersion(SqliteConnection connection, SqliteTransaction? transaction = null) =>
        Pragma(connection, transaction, "user_version");

    /// <summary>
    /// Refuses a file that is not a result file or is newer than <paramref name="migrations"/> know.
    /// </summary>
    /// <exception cref="ResultStoreException">Not a result file, or a newer schema.</exception>
    public static void CheckCompatible(SqliteConnection connection, string path, IReadOnlyList<Migration> migrations)
    {
        var applicationId = Pragma(connection, null, "application_id");
        var version = CurrentVersion(connection);
        var known = migrations.Count == 0 ? 0 : migrations[^1].Version;
        if (applicationId != ApplicationId && (applicationId != 0 || version != 0 || HasObjects(connection)))
        {
            throw new ResultStoreException($"{path}: this SQLite file is not a BenchRunner result file (application id {applicationId}); give a new file name or an existing result file.");
        }

        if (version > known)
        {
            throw new ResultStoreException($"{path}: the result file has schema version {version}, written by a newer BenchRunner; this build knows versions up to {known}. Open it with a newer BenchRunner.");
        }
    }

    /// <summary>Applies every migration above the file's version, one transaction each; returns how many ran.</summary>
    /// <exception cref="ResultStoreException">A step failed; the file stays at the last version that succeeded.</exception>
    public static int Migrate(SqliteConnection connection, string path, IReadOnlyList<Migration> migrations)
    {
        int applied = 0;
        foreach (var migration in migrations)
        {
            if (migration.Version <= CurrentVersion(connection))
            {
                continue;
            }

            using var transaction = connection.BeginTransaction();

            // Another process may have migrated between the check above and taking the write lock.
            if (migration.Version <= CurrentVersion(connection, transaction))
            {
                continue;
            }

            try
            {
                Execute(connection, transaction, migration.Sql);
                Execute(connection, transaction, $"PRAGMA application_id = {ApplicationId.ToString(CultureInfo.InvariantCulture)};");
                Execute(connection, transaction, $"PRAGMA user_version = {migration.Version.ToString(CultureInfo.InvariantCulture)};");
                transaction.Commit();
                applied++;
            }
            catch (SqliteException e)
            {
                throw new ResultStoreException($"{path}: schema migration {migration.Version} ({migration.Name}) failed: {e.Message}", e);
            }
        }

        return applied;
    }

    private static bool HasObjects(SqliteConnection connection)
    {
        using var command = connection.CreateCommand();
        command.CommandText = "SELECT count(*) FROM sqlite_schema";
        return (long)command.ExecuteScalar()! > 0;
    }

    private static int Pragma(SqliteConnection connection, SqliteTransaction? transaction, string name)
    {
        using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = $"PRAGMA {name}";
        return Convert.ToInt32(command.ExecuteScalar(), CultureInfo.InvariantCulture);
    }

    private static void Execute(SqliteConnection connection, SqliteTransaction transaction, string sql)
    {
        using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
