namespace BenchRunner.Core.Diagnostics;

/// <summary>
/// A place in a user's input file: file name, 1-based line and 1-based column.
/// A column of 0 means "the whole line"; a line of 0 means "the whole file".
/// </summary>
public readonly record struct SourceLocation(string File, int Line, int Column)
{
    /// <summary>A location naming only the file.</summary>
    public static SourceLocation OfFile(string file) => new(file, 0, 0);

    /// <summary>A location naming a file and line, with no column.</summary>
    public static SourceLocation OfLine(string file, int line) => new(file, line, 0);

    /// <summary>Formats as <c>file:line:column</c>, dropping the parts that are zero.</summary>
    public override string ToString() => (Line, Column) switch
    {
        (0, _) => File,
        (_, 0) => $"{File}:{Line}",
        _ => $"{File}:{Line}:{Column}",
    };
}
