using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Tests.Support;

namespace BenchRunner.Instruments.Tests.Profiles;

/// <summary>The example profiles of docs/examples/profiles, loaded once.</summary>
internal static class ExampleProfiles
{
    private static readonly Lazy<DriverProfile> LazyVna = new(() => Load("bench-vna.yaml"));
    private static readonly Lazy<DriverProfile> LazySa = new(() => Load("bench-sa.yaml"));
    private static readonly Lazy<DriverProfile> LazyGen = new(() => Load("bench-gen.yaml"));

    public static DriverProfile Vna => LazyVna.Value;

    public static DriverProfile Sa => LazySa.Value;

    public static DriverProfile Gen => LazyGen.Value;

    public static string PathOf(string file) => RepositoryFiles.PathOf(Path.Combine("docs", "examples", "profiles", file));

    private static DriverProfile Load(string file) => DriverProfile.Load(PathOf(file));
}
