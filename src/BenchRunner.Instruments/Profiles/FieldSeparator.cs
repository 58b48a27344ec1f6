namespace BenchRunner.Instruments.Profiles;

/// <summary>What separates the fields of a data line.</summary>
public enum FieldSeparator
{
    /// <summary>One or more spaces or tabs (<c>whitespace</c>).</summary>
    Whitespace,

    /// <summary>A comma, with optional spaces around it (<c>comma</c>).</summary>
    Comma,

    /// <summary>A semicolon, with optional spaces around it (<c>semicolon</c>).</summary>
    Semicolon,
}
