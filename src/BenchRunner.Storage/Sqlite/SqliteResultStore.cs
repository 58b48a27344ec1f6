using System.Globalization;
using BenchRunner.Storage.Columns;
using BenchRunner.Storage.Locking;
using BenchRunner.Storage.Schema;
using Microsoft.Data.Sqlite;

namespace BenchRunner.Storage.Sqlite;

/// <summary>
/// The result file: one SQLite database in WAL mode holding runs, the instruments they used,
/// every sweep (trace data as compact BLOBs), figures and checks. Each write is one transaction,
/// committed before the method returns, so a crash loses at most the write in flight. The file
/// layout is described in docs/storage.md; any SQLite browser can read it.
/// </summary>
/// <remarks>
/// Several stores (in one process or many) may have the same file open. Calls on one store are
/// serialised, so it may be shared between threads. Storage keeps what it is given: it knows
/// nothing of transports, instrument protocols or plan syntax.
/// </remarks>
public sealed partial class SqliteResultStore : IResultStore
{
    /// <summary>The message stored with a run found still running at open.</summary>
    public const string InterruptedMessage = "the program stopped before the run finished; it was still marked running when the result file was next opened";

    /// <summary>How long a write waits for another program's write to finish: 5 s.</summary>
    public static readonly TimeSpan BusyTimeout = TimeSpan.FromSeconds(5);

    private readonly SqliteConnection _connection;
    private readonly StoreLock _storeLock;
    private readonly TimeProvider _time;
    private readonly Lock _gate = new();
    private bool _disposed;

    private SqliteResultStore(string path, SqliteConnection connection, StoreLock storeLock, TimeProvider time)
    {
        Path = path;
        _connection = connection;
        _storeLock = storeLock;
        _time = time;
    }

    /// <summary>The newest schema version this build knows and writes.</summary>
    public static int SchemaVersion => SchemaMigrations.All[^1].Version;

    /// <summary>The full path of the result file.</summary>
    public string Path { get; }

    /// <summary>
    /// The runs that were still marked running when this store opened the file and no other store
    /// had it open, and so were marked interrupted; oldest first. Empty when there were none, or
    /// when another store had the file open (its runs may be live).
    /// </summary>
    public IReadOnlyList<long> InterruptedAtOpen { get; private set; } = [];

    /// <summary>
    /// Opens the result file at <paramref name="path"/>, creating it if it does not exist, and
    /// brings its schema up to date. Runs a crash left running are marked interrupted (see
    /// <see cref="InterruptedAtOpen"/>).
    /// </summary>
    /// <param name="path">The file; its folder must exist. The store also uses <c>path-wal</c>, <c>path-shm</c> and <c>path-lock</c> beside it.</param>
    /// <param name="timeProvider">The clock for timestamps; the system clock by default.</param>
    /// <exception cref="ResultStoreException">Not a result file, a newer schema, a damaged file, or the file cannot be opened.</exception>
    public static SqliteResultStore Open(string path, TimeProvider? timeProvider = null) =>
        Open(path, timeProvider ?? TimeProvider.System, SchemaMigrations.All);

    /// <summary>Opens with the given migrations (tests of the migration machinery).</summary>
    internal static SqliteResultStore Open(string path, TimeProvider time, IReadOnlyList<Migration> migrations)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(path);
        var fullPath = System.IO.Path.GetFullPath(path);
        var folder = System.IO.Path.GetDirectoryName(fullPath);
        if (folder is null || !Directory.Exists(folder))
        {
            throw new ResultStoreException($"{fullPath}: the folder does not exist.");
        }

        StoreLock? storeLock = null;
        SqliteConnection? connection = null;
        try
        {
            connection = Connect(fullPath, migrations);

            // Taken only once the file is known to be a result file, so a refused file gets no lock file beside it.
            storeLock = StoreLock.Take(fullPath, BusyTimeout);
            var store = new SqliteResultStore(fullPath, connection, storeLock, time);
            if (storeLock.IsSole)
            {
                store.InterruptedAtOpen = store.MarkRunningAsInterrupted();
            }

            storeLock.Share(BusyTimeout);
            return store;
        }
        catch (Exception e) when (e is SqliteException or IOException or UnauthorizedAccessException)
        {
            connection?.Dispose();
            storeLock?.Dispose();
            throw new ResultStoreException($"{fullPath}: the result file cannot be opened: {e.Message}", e);
        }
        catch
        {
            connection?.Dispose();
            storeLock?.Dispose();
            throw;
        }
    }

    /// <summary>Closes the file. Runs still running stay so; the next sole opener marks them interrupted.</summary>
    public void Dispose()
    {
        lock (_gate)
        {
            if (_disposed)
            {
                return;
            }

            _disposed = true;
            _connection.Dispose();
            _storeLock.Dispose();
        }
    }

    /// <inheritdoc cref="Dispose"/>
    public ValueTask DisposeAsync()
    {
        Dispose();
        return ValueTask.CompletedTask;
    }

    /// <summary>Runs one statement on the store's own connection; for tests of per-connection settings.</summary>
    internal object? QueryScalar(string sql)
    {
        lock (_gate)
        {
            ThrowIfDisposed();
            return Scalar(_connection, sql);
        }
    }

    private static SqliteConnection Connect(string path, IReadOnlyList<Migration> migrations)
    {
        var connectionString = new SqliteConnectionStringBuilder
        {
            DataSource = path,
            Mode = SqliteOpenMode.ReadWriteCreate,
            ForeignKeys = true,
            // Closing must release the file, not park it in a pool.
            Pooling = false,
            DefaultTimeout = (int)BusyTimeout.TotalSeconds,
        }.ToString();
        var connection = new SqliteConnection(connectionString);
        try
        {
            connection.Open();
            SchemaMigrator.CheckCompatible(connection, path, migrations);
            var journal = Scalar(connection, "PRAGMA journal_mode = WAL");
            if (!string.Equals(journal as string, "wal", StringComparison.OrdinalIgnoreCase))
            {
                throw new ResultStoreException($"{path}: the file cannot be put in WAL mode (journal mode stays \"{journal}\").");
            }

            Scalar(connection, "PRAGMA synchronous = FULL");
            Scalar(connection, $"PRAGMA busy_timeout = {((int)BusyTimeout.TotalMilliseconds).ToString(CultureInfo.InvariantCulture)}");
            SchemaMigrator.Migrate(connection, path, migrations);
            return connection;
        }
        catch
        {
            connection.Dispose();
            throw;
        }
    }

    private static object? Scalar(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return command.ExecuteScalar();
    }

    private IReadOnlyList<long> MarkRunningAsInterrupted()
    {
        lock (_gate)
        {
            using var transaction = _connection.BeginTransaction();
            using var command = Command(transaction,
                "UPDATE runs SET status = 'interrupted', ended_utc = $now, error_message = coalesce(error_message, $message) WHERE status = 'running' RETURNING id");
            command.With("$now", UtcText.From(_time.GetUtcNow())).With("$message", InterruptedMessage);
            var ids = new List<long>();
            using (var reader = command.ExecuteReader())
            {
                while (reader.Read())
                {
                    ids.Add(reader.GetInt64(0));
                }
            }

            transaction.Commit();
            ids.Sort();
            return ids;
        }
    }

    private SqliteCommand Command(SqliteTransaction? transaction, string sql)
    {
        var command = _connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        return command;
    }

    private void ThrowIfDisposed() => ObjectDisposedException.ThrowIf(_disposed, this);
}
