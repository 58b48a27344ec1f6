using System.Diagnostics.CodeAnalysis;

namespace BenchRunner.Core.Figures;

/// <summary>
/// A figure computed from a trace, or the reason it could not be computed (no crossing inside
/// the sweep, an empty range, too few points...). A figure that cannot be computed is never
/// replaced by a made-up number.
/// </summary>
/// <typeparam name="T">The figure's type.</typeparam>
public readonly struct FigureResult<T>
{
    private const string DefaultReason = "no figure was computed";

    private readonly T? _value;
    private readonly string? _reason;
    private readonly bool _available;

    private FigureResult(T? value, string? reason, bool available)
    {
        _value = value;
        _reason = reason;
        _available = available;
    }

    /// <summary>True when the figure was computed and <see cref="Value"/> may be read.</summary>
    [MemberNotNullWhen(false, nameof(Reason))]
    public bool IsAvailable => Reason is null;

    /// <summary>Why the figure is unavailable; null when it is available.</summary>
    /// <remarks>A default-constructed result is unavailable, so an uninitialised field never reads as a figure.</remarks>
    public string? Reason => _available ? null : _reason ?? DefaultReason;

    /// <summary>The figure.</summary>
    /// <exception cref="InvalidOperationException">The figure is unavailable; the message is <see cref="Reason"/>.</exception>
    public T Value => IsAvailable ? _value! : throw new InvalidOperationException(Reason);

    /// <summary>A computed figure.</summary>
    public static FigureResult<T> Available(T value) => new(value, null, true);

    /// <summary>A figure that could not be computed, with the reason.</summary>
    /// <exception cref="ArgumentException">The reason is empty.</exception>
    public static FigureResult<T> Unavailable(string reason)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(reason);
        return new(default, reason, false);
    }

    /// <summary>Maps an available figure; an unavailable one keeps its reason.</summary>
    public FigureResult<TOut> Select<TOut>(Func<T, TOut> map) =>
        IsAvailable ? FigureResult<TOut>.Available(map(_value!)) : FigureResult<TOut>.Unavailable(Reason);

    /// <summary>Continues with a computation that may itself be unavailable.</summary>
    public FigureResult<TOut> Then<TOut>(Func<T, FigureResult<TOut>> next) =>
        IsAvailable ? next(_value!) : FigureResult<TOut>.Unavailable(Reason);

    /// <summary>The value's text, or <c>unavailable: reason</c>.</summary>
    public override string ToString() => IsAvailable ? $"{_value}" : $"unavailable: {Reason}";
}
