namespace BenchRunner.Execution.Bench;

/// <summary>The words of the bench file format (docs/bench-format.md).</summary>
internal static class BenchFileKeys
{
    public const string BenchName = "bench";
    public const string Description = "description";
    public const string InstrumentMap = "instruments";
    public const string Paths = "paths";
    public const string Compensation = "compensation";

    public const string Kind = "kind";
    public const string Adapter = "adapter";
    public const string Profile = "profile";
    public const string Connection = "connection";
    public const string Limits = "limits";

    public const string MaxInputLevel = "max-input-level";
    public const string MaxOutputLevel = "max-output-level";

    public const string Arrow = "->";

    public const string Probe = "probe";
    public const string Impedance = "impedance";
    public const string Attenuators = "attenuators";
    public const string DcBlock = "dc-block";
    public const string Cable = "cable";

    public static readonly IReadOnlyList<string> Top = [BenchName, Description, InstrumentMap, Paths, Compensation];
    public static readonly IReadOnlyList<string> CompensationKeys = [Probe, Impedance, Attenuators, DcBlock, Cable];
    public static readonly IReadOnlyList<string> InstrumentKeys = [Kind, Adapter, Profile, Connection, Limits, Description];
    public static readonly IReadOnlyList<string> LimitKeys = [MaxInputLevel, MaxOutputLevel];
}
