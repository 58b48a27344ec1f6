using BenchRunner.Core.Traces;

namespace BenchRunner.Core.Masks;

/// <summary>The words of the mask file format, shared by its reader and writer.</summary>
internal static class MaskFileKeys
{
    public const string Mask = "mask";
    public const string Description = "description";
    public const string AppliesTo = "applies-to";
    public const string Interpolation = "interpolation";
    public const string Reference = "reference";
    public const string Upper = "upper";
    public const string Lower = "lower";

    /// <summary>The list item that separates two sections of a limit line.</summary>
    public const string Gap = "gap";

    /// <summary>Every key, in the order the writer puts them.</summary>
    public static readonly IReadOnlyList<string> All = [Mask, Description, AppliesTo, Interpolation, Reference, Upper, Lower];

    public static readonly IReadOnlyList<(string Word, TraceQuantity Value)> QuantityWords =
    [
        ("S11", TraceQuantity.S11), ("S21", TraceQuantity.S21), ("S12", TraceQuantity.S12),
        ("S22", TraceQuantity.S22), ("power", TraceQuantity.Power),
    ];

    public static readonly IReadOnlyList<(string Word, MaskInterpolation Value)> Interpolations =
        [("linear", MaskInterpolation.Linear), ("log", MaskInterpolation.Logarithmic)];

    public static readonly IReadOnlyList<(string Word, MaskReference Value)> References =
        [("absolute", MaskReference.Absolute), ("peak", MaskReference.RelativeToPeak)];

    public static string WordFor<T>(IReadOnlyList<(string Word, T Value)> words, T value)
        where T : struct, Enum =>
        words.First(w => EqualityComparer<T>.Default.Equals(w.Value, value)).Word;
}
