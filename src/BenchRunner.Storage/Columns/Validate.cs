using System.Text.Json;

namespace BenchRunner.Storage.Columns;

/// <summary>Argument checks for what callers hand to the store; each failure names the field.</summary>
internal static class Validate
{
    public static void Required(string? value, string field)
    {
        if (string.IsNullOrWhiteSpace(value))
        {
            throw new ArgumentException($"{field} must not be empty.", field);
        }
    }

    public static void OptionalText(string? value, string field)
    {
        if (value is not null && string.IsNullOrWhiteSpace(value))
        {
            throw new ArgumentException($"{field} is blank; give null when there is none.", field);
        }
    }

    public static void Json(string? value, string field)
    {
        if (value is null)
        {
            return;
        }

        try
        {
            using var _ = JsonDocument.Parse(value);
        }
        catch (JsonException e)
        {
            throw new ArgumentException($"{field} is not valid JSON: {e.Message}", field, e);
        }
    }

    public static void Finite(double? value, string field)
    {
        if (value is { } v && !double.IsFinite(v))
        {
            throw new ArgumentException($"{field} must be finite, not {v}.", field);
        }
    }
}
