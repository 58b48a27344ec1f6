using System.Globalization;
using BenchRunner.Core.Quantities;
using YamlDotNet.Core;
using YamlDotNet.Core.Events;
using static BenchRunner.Core.Masks.MaskFileKeys;

namespace BenchRunner.Core.Masks;

/// <summary>
/// Writes a <see cref="LimitMask"/> in the mask file format, with numbers written so that
/// reading the file back gives exactly the same corners.
/// </summary>
internal static class MaskFileWriter
{
    private static readonly (double Scale, string Unit)[] FrequencyUnits = [(1e9, "GHz"), (1e6, "MHz"), (1e3, "kHz")];

    public static void Write(TextWriter writer, LimitMask mask)
    {
        var emitter = new Emitter(writer, new EmitterSettings().WithIndentedSequences());
        emitter.Emit(new StreamStart());
        emitter.Emit(new DocumentStart(null, null, isImplicit: true));
        emitter.Emit(new MappingStart(null, null, isImplicit: true, MappingStyle.Block));

        Pair(emitter, Mask, mask.Name);
        if (mask.Description is { } description)
        {
            Text(emitter, Description);
            emitter.Emit(new Scalar(null, null, description, description.Contains('\n') ? ScalarStyle.Literal : ScalarStyle.Any, true, true));
        }

        if (mask.Parameter is { } parameter)
        {
            Pair(emitter, AppliesTo, WordFor(QuantityWords, parameter));
        }

        Pair(emitter, Interpolation, WordFor(Interpolations, mask.Interpolation));
        Pair(emitter, Reference, WordFor(References, mask.Reference));
        Line(emitter, Upper, mask.Upper, mask.LevelUnitSymbol);
        Line(emitter, Lower, mask.Lower, mask.LevelUnitSymbol);

        emitter.Emit(new MappingEnd());
        emitter.Emit(new DocumentEnd(isImplicit: true));
        emitter.Emit(new StreamEnd());
    }

    /// <summary>
    /// Formats a frequency with the largest prefix that still reads back to the identical
    /// number of hertz, falling back to plain hertz.
    /// </summary>
    internal static string FormatFrequency(Frequency frequency)
    {
        foreach (var (scale, unit) in FrequencyUnits)
        {
            if (frequency.Hertz < scale)
            {
                continue;
            }

            // 15 digits first: the division often leaves noise in the 17th digit (137.12345678900002).
            foreach (var format in (string[])["G15", "R"])
            {
                var candidate = $"{(frequency.Hertz / scale).ToString(format, CultureInfo.InvariantCulture)} {unit}";
                if (Frequency.Parse(candidate) is { Success: true } parsed && parsed.Value == frequency)
                {
                    return candidate;
                }
            }
        }

        return $"{QuantityText.Invariant(frequency.Hertz)} Hz";
    }

    private static void Line(IEmitter emitter, string key, LimitLine? line, string unit)
    {
        if (line is null)
        {
            return;
        }

        Text(emitter, key);
        emitter.Emit(new SequenceStart(null, null, isImplicit: true, SequenceStyle.Block));
        for (int s = 0; s < line.Sections.Length; s++)
        {
            if (s > 0)
            {
                Text(emitter, Gap);
            }

            foreach (var corner in line.Sections[s])
            {
                emitter.Emit(new MappingStart(null, null, isImplicit: true, MappingStyle.Block));
                Pair(emitter, FormatFrequency(corner.Frequency), $"{QuantityText.Invariant(corner.LevelDb)} {unit}");
                emitter.Emit(new MappingEnd());
            }
        }

        emitter.Emit(new SequenceEnd());
    }

    private static void Pair(IEmitter emitter, string key, string value)
    {
        Text(emitter, key);
        Text(emitter, value);
    }

    private static void Text(IEmitter emitter, string value) =>
        emitter.Emit(new Scalar(null, null, value, ScalarStyle.Any, isPlainImplicit: true, isQuotedImplicit: true));
}
