using System.Text.Json;
using System.Text.Json.Serialization;

namespace BenchRunner.Daemon.Status;

/// <summary>Writes and reads the daemon's status file (JSON, snake_case names).</summary>
public static class StatusFile
{
    private static readonly JsonSerializerOptions Options = new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.SnakeCaseLower,
        WriteIndented = true,
        DefaultIgnoreCondition = JsonIgnoreCondition.Never,
    };

    /// <summary>Writes <paramref name="status"/> to <paramref name="path"/> whole: to a temporary file beside it, then renamed over it.</summary>
    /// <exception cref="IOException">The folder cannot be written.</exception>
    public static void Write(string path, DaemonStatus status)
    {
        var temporary = path + ".tmp";
        File.WriteAllText(temporary, ToJson(status));
        File.Move(temporary, path, overwrite: true);
    }

    /// <summary>The status as JSON text.</summary>
    public static string ToJson(DaemonStatus status) => JsonSerializer.Serialize(status, Options);

    /// <summary>Reads the status file at <paramref name="path"/>, or null when there is none.</summary>
    /// <exception cref="IOException">The file cannot be read.</exception>
    /// <exception cref="JsonException">The file is not a status file.</exception>
    public static DaemonStatus? Read(string path)
    {
        if (!File.Exists(path))
        {
            return null;
        }

        var status = JsonSerializer.Deserialize<DaemonStatus>(File.ReadAllText(path), Options);
        return status is { Format: DaemonStatus.FormatName } ? status : throw new JsonException($"{path}: not a daemon status file (expected format {DaemonStatus.FormatName}).");
    }
}
