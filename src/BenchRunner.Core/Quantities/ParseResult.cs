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
    private readonly string? _error;
    private readonly bool _success;

    private ParseResult(T? value, string? error, bool success)
    {
        _value = value;
        _error = error;
        _success = success;
    }

    /// <summary>True when parsing succeeded and <see cref="Value"/> may be read. False for <c>default</c>.</summary>
    [MemberNotNullWhen(false, nameof(Error))]
    public bool Success => _success;

    /// <summary>What was wrong, when <see cref="Success"/> is false.</summary>
    public string? Error => _success ? null : _error ?? "nothing was parsed";

    /// <summary>The parsed value.</summary>
    /// <exception cref="InvalidOperationException">Parsing failed.</exception>
    public T Value => Success ? _value! : throw new InvalidOperationException(Error);

    /// <summary>A successful result.</summary>
    public static ParseResult<T> Ok(T value) => new(value, null, success: true);

    /// <summary>A failed result with a message saying what was expected.</summary>
    public static ParseResult<T> Fail(string error) => new(default, error ?? throw new ArgumentNullException(nameof(error)), success: false);

    /// <summary>Returns the value, or throws <see cref="FormatException"/> with the error message.</summary>
    public T GetValueOrThrow() => Success ? _value! : throw new FormatException(Error);

    /// <summary>Maps a successful value; a failure passes through unchanged.</summary>
    public ParseResult<TOut> Select<TOut>(Func<T, TOut> map) =>
        Success ? ParseResult<TOut>.Ok(map(_value!)) : ParseResult<TOut>.Fail(Error);
}
