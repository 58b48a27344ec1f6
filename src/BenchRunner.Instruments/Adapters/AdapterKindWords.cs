namespace BenchRunner.Instruments.Adapters;

/// <summary>The words for each <see cref="AdapterKind"/>, in bench files and in driver profiles: the only place they are written.</summary>
public static class AdapterKindWords
{
    /// <summary>A driver profile's word for <see cref="AdapterKind.Raw"/>.</summary>
    public const string RawInProfile = "raw";

    /// <summary>A bench file's word for <see cref="AdapterKind.Raw"/> (the instrument is spoken to through its profile).</summary>
    public const string RawInBench = "profile";

    /// <summary>The word for <see cref="AdapterKind.Scpi"/>, in bench files and profiles alike.</summary>
    public const string Scpi = "scpi";

    /// <summary>The words of a driver profile's <c>adapter:</c>.</summary>
    public static IReadOnlyList<(string Word, AdapterKind Value)> InProfiles { get; } = [(RawInProfile, AdapterKind.Raw), (Scpi, AdapterKind.Scpi)];

    /// <summary>The words of a bench file's <c>adapter:</c>.</summary>
    public static IReadOnlyList<(string Word, AdapterKind Value)> InBenches { get; } = [(Scpi, AdapterKind.Scpi), (RawInBench, AdapterKind.Raw)];

    /// <summary>The word a driver profile uses for <paramref name="adapter"/>.</summary>
    public static string InProfile(AdapterKind adapter) => InProfiles.First(w => w.Value == adapter).Word;

    /// <summary>The word a bench file uses for <paramref name="adapter"/>.</summary>
    public static string InBench(AdapterKind adapter) => InBenches.First(w => w.Value == adapter).Word;
}
