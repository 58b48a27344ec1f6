using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Profiles;

/// <summary>The example profiles of docs/examples/profiles, loaded once.</summary>
internal static class ExampleProfiles
{
    private static readonly Lazy<DriverProfile> LazyVna = new(() => Load("bench-vna.yaml"));
    private static readonly Lazy<DriverProfile> LazySa = new(() => Load("bench-sa.yaml"));
    private static readonly Lazy<DriverProfile> LazyGen = new(() => Load("bench-gen.yaml"));
    private static readonly Lazy<DriverProfile> LazyScpiVna = new(() => Load("bench-vna-scpi.yaml"));
    private static readonly Lazy<DriverProfile> LazyScpiSa = new(() => Load("bench-sa-scpi.yaml"));
    private static readonly Lazy<DriverProfile> LazyScpiGen = new(() => Load("bench-gen-scpi.yaml"));

    public static DriverProfile Vna => LazyVna.Value;

    public static DriverProfile Sa => LazySa.Value;

    public static DriverProfile Gen => LazyGen.Value;

    public static DriverProfile ScpiVna => LazyScpiVna.Value;

    public static DriverProfile ScpiSa => LazyScpiSa.Value;

    public static DriverProfile ScpiGen => LazyScpiGen.Value;

    public static string PathOf(string file) => RepositoryFiles.PathOf(Path.Combine("docs", "examples", "profiles", file));

    private static DriverProfile Load(string file) => DriverProfile.Load(PathOf(file));
}
