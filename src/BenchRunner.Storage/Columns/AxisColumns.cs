using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;

namespace BenchRunner.Storage.Columns;

/// <summary>
/// A frequency axis as the <c>sweeps</c> columns hold it: kind, first and last frequency, point
/// count, and the points themselves as a BLOB unless start, stop and count rebuild them exactly.
/// </summary>
/// <remarks>
/// A linear axis is plain arithmetic and rebuilds bit for bit anywhere, so it keeps no BLOB. A
/// logarithmic axis keeps one, because exp and log may differ in the last bit between platforms;
/// it is read back as logarithmic when the rebuild matches the BLOB, and as a list otherwise.
/// </remarks>
internal sealed record AxisColumns(string Kind, double StartHz, double StopHz, int PointCount, byte[]? PointsBlob)
{
    /// <summary>The columns for <paramref name="axis"/>.</summary>
    public static AxisColumns From(FrequencyAxis axis)
    {
        var kind = ColumnText.From(axis.Kind);
        var blob = axis.Kind == FrequencyAxisKind.Linear && Rebuild(axis.Kind, axis.Start.Hertz, axis.Stop.Hertz, axis.Count) is { } rebuilt && rebuilt.SamePointsAs(axis)
            ? null
            : SampleBlob.FromReal(axis.Hertz);
        return new AxisColumns(kind, axis.Start.Hertz, axis.Stop.Hertz, axis.Count, blob);
    }

    /// <summary>The axis these columns describe.</summary>
    /// <exception cref="FormatException">The columns do not describe a valid axis.</exception>
    public FrequencyAxis ToAxis()
    {
        var kind = ColumnText.AxisKind(Kind);
        try
        {
            var rebuilt = Rebuild(kind, StartHz, StopHz, PointCount);
            if (PointsBlob is null)
            {
                return rebuilt ?? throw new FormatException($"a {Kind} axis needs its points stored");
            }

            var stored = FrequencyAxis.FromHertz(SampleBlob.ToReal(PointsBlob));
            if (stored.Count != PointCount)
            {
                throw new FormatException($"the axis holds {stored.Count} points, not {PointCount}");
            }

            return rebuilt is not null && rebuilt.SamePointsAs(stored) ? rebuilt : stored;
        }
        catch (ArgumentException e)
        {
            throw new FormatException($"the frequency axis is not valid: {e.Message}", e);
        }
    }

    private static FrequencyAxis? Rebuild(FrequencyAxisKind kind, double startHz, double stopHz, int points) => kind switch
    {
        FrequencyAxisKind.Linear => FrequencyAxis.Linear(Frequency.FromHertz(startHz), Frequency.FromHertz(stopHz), points),
        FrequencyAxisKind.Logarithmic => FrequencyAxis.Logarithmic(Frequency.FromHertz(startHz), Frequency.FromHertz(stopHz), points),
        _ => null,
    };
}
