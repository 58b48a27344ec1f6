namespace BenchRunner.Instruments.Profiles;

/// <summary>
/// One column of a data line. The number read is turned into <c>number × Scale + Offset</c>
/// before it is used (for a frequency column, before its unit is applied).
/// </summary>
/// <param name="Kind">What the column holds.</param>
/// <param name="Scale">The factor applied to the number read; 1 by default, never 0.</param>
/// <param name="Offset">Added after scaling; 0 by default.</param>
public sealed record ReplyColumn(ColumnKind Kind, double Scale = 1, double Offset = 0)
{
    /// <summary>True for the four frequency kinds.</summary>
    public bool IsFrequency => Kind is ColumnKind.FrequencyHz or ColumnKind.FrequencyKhz or ColumnKind.FrequencyMhz or ColumnKind.FrequencyGhz;

    /// <summary>Hertz per unit of a frequency column (1 for the other kinds).</summary>
    public double HertzPerUnit => Kind switch
    {
        ColumnKind.FrequencyKhz => 1e3,
        ColumnKind.FrequencyMhz => 1e6,
        ColumnKind.FrequencyGhz => 1e9,
        _ => 1,
    };
}
