using Microsoft.Data.Sqlite;

namespace BenchRunner.Storage.Columns;

/// <summary>Binds parameters, mapping null to SQL NULL.</summary>
internal static class Parameters
{
    public static SqliteCommand With(this SqliteCommand command, string name, object? value)
    {
        command.Parameters.AddWithValue(name, value ?? DBNull.Value);
        return command;
    }
}
