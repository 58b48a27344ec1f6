namespace BenchRunner.Instruments.Capabilities;

/// <summary>
/// Who an instrument says it is: maker, model, serial number and firmware level, the four
/// fields of an IEEE 488.2 <c>*IDN?</c> reply (§10.14); an unavailable field is "0".
/// Stored with every result.
/// </summary>
/// <param name="Maker">Manufacturer.</param>
/// <param name="Model">Model.</param>
/// <param name="Serial">Serial number, or "0".</param>
/// <param name="Firmware">Firmware level, or "0".</param>
public sealed record InstrumentIdentity(string Maker, string Model, string Serial, string Firmware)
{
    /// <summary>An identity for an instrument that could not be asked.</summary>
    public static InstrumentIdentity Unknown { get; } = new("0", "0", "0", "0");

    /// <summary>
    /// Parses an IEEE 488.2 identification reply: four comma-separated fields. Surrounding
    /// spaces are trimmed; a missing trailing field is "0".
    /// </summary>
    public static Core.Quantities.ParseResult<InstrumentIdentity> ParseIdn(string reply)
    {
        ArgumentNullException.ThrowIfNull(reply);
        var fields = reply.Trim().Split(',').Select(f => f.Trim()).ToArray();
        if (fields.Length is < 2 or > 4 || fields.Any(f => f.Length == 0))
        {
            return Core.Quantities.ParseResult<InstrumentIdentity>.Fail(
                $"\"{Errors.InstrumentException.Printable(reply)}\" is not an identification reply; expected four comma-separated fields: maker, model, serial, firmware (IEEE 488.2 §10.14)");
        }

        string Field(int i) => i < fields.Length ? fields[i] : "0";
        return Core.Quantities.ParseResult<InstrumentIdentity>.Ok(new InstrumentIdentity(Field(0), Field(1), Field(2), Field(3)));
    }

    /// <summary>Formats as the four fields separated by commas.</summary>
    public override string ToString() => $"{Maker},{Model},{Serial},{Firmware}";
}
