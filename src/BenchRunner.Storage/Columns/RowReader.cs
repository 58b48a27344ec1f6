using Microsoft.Data.Sqlite;

namespace BenchRunner.Storage.Columns;

/// <summary>Reads typed, possibly null columns by name.</summary>
internal static class RowReader
{
    public static string Text(this SqliteDataReader row, string column) => row.GetString(row.GetOrdinal(column));

    public static string? TextOrNull(this SqliteDataReader row, string column)
    {
        var i = row.GetOrdinal(column);
        return row.IsDBNull(i) ? null : row.GetString(i);
    }

    public static long Integer(this SqliteDataReader row, string column) => row.GetInt64(row.GetOrdinal(column));

    public static long? IntegerOrNull(this SqliteDataReader row, string column)
    {
        var i = row.GetOrdinal(column);
        return row.IsDBNull(i) ? null : row.GetInt64(i);
    }

    public static double Real(this SqliteDataReader row, string column) => row.GetDouble(row.GetOrdinal(column));

    public static double? RealOrNull(this SqliteDataReader row, string column)
    {
        var i = row.GetOrdinal(column);
        return row.IsDBNull(i) ? null : row.GetDouble(i);
    }

    public static byte[]? BlobOrNull(this SqliteDataReader row, string column)
    {
        var i = row.GetOrdinal(column);
        return row.IsDBNull(i) ? null : row.GetFieldValue<byte[]>(i);
    }

    public static DateTimeOffset Utc(this SqliteDataReader row, string column) => UtcText.Parse(row.Text(column));

    public static DateTimeOffset? UtcOrNull(this SqliteDataReader row, string column) =>
        row.TextOrNull(column) is { } text ? UtcText.Parse(text) : null;
}
