using System.Diagnostics.CodeAnalysis;

namespace BenchRunner.Core.Quantities;

/// <summary>
/// The outcome of parsing user text: either a value, or a message saying what was wrong
/// and what was expected. Used where failure is an ordinary event (a typo in a file),
/// so that callers can attach a file and line instead of catching exceptions.
/// </summary>
/// <typeparam name="T">The parsed value's type.</typeparam>
public readonly struct ParseResult<T>
{
    private readonly T? _value;

    private ParseResult(T? value, string? error)
    {
        _value = value;
        Error = error;
    }

    /// <summary>True when parsing succeeded and <see cref="Value"/> may be read.</summary>
    [MemberNotNullWhen(false, nameof(Error))]
    public bool Success => Error is null;

    /// <summary>What was wrong, when <see cref="Success"/> is false.</summary>
    public string? Error { get; }

    /// <summary>The parsed value.</summary>
    /// <exception cref="InvalidOperationException">Parsing failed.</exception>
    public T Value => Success ? _value! : throw new InvalidOperationException(Error);

    /// <summary>A successful result.</summary>
    public static ParseResult<T> Ok(T value) => new(value, null);

    /// <summary>A failed result with a message saying what was expected.</summary>
    public static ParseResult<T> Fail(string error) => new(default, error);

    /// <summary>Returns the value, or throws <see cref="FormatException"/> with the error message.</summary>
    public T GetValueOrThrow() => Success ? _value! : throw new FormatException(Error);

    /// <summary>Maps a successful value; a failure passes through unchanged.</summary>
    public ParseResult<TOut> Select<TOut>(Func<T, TOut> map) =>
        Success ? ParseResult<TOut>.Ok(map(_value!)) : ParseResult<TOut>.Fail(Error);
}
