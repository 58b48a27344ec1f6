using Microsoft.Data.Sqlite;

namespace BenchRunner.Storage.Tests.Support;

/// <summary>Looks inside a result file with a plain SQLite connection, as any other tool would.</summary>
internal static class StoreFile
{
    public static List<object?[]> Query(string path, string sql, params (string Name, object? Value)[] parameters)
    {
        using var connection = Connect(path);
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        foreach (var (name, value) in parameters)
        {
            command.Parameters.AddWithValue(name, value ?? DBNull.Value);
        }

        using var reader = command.ExecuteReader();
        var rows = new List<object?[]>();
        while (reader.Read())
        {
            var row = new object?[reader.FieldCount];
            for (int i = 0; i < row.Length; i++)
            {
                row[i] = reader.IsDBNull(i) ? null : reader.GetValue(i);
            }

            rows.Add(row);
        }

        return rows;
    }

    public static object? Scalar(string path, string sql) => Query(path, sql) is [var row, ..] ? row[0] : null;

    public static void Execute(string path, string sql)
    {
        using var connection = Connect(path);
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }

    private static SqliteConnection Connect(string path)
    {
        var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        return connection;
    }
}
