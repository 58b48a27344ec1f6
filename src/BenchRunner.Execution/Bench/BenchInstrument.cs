using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Profiles;

namespace BenchRunner.Execution.Bench;

/// <summary>One instrument of a bench, under the role name plans use for it (e.g. <c>vna</c>).</summary>
/// <param name="Role">The role name, the instrument's key in the bench file.</param>
/// <param name="Kind">What the instrument is.</param>
/// <param name="Adapter">How it is spoken to.</param>
/// <param name="Connection">Where it is reached.</param>
/// <param name="Profile">The driver profile, when one is given (required for <see cref="AdapterKind.Raw"/>, <c>adapter: profile</c>).</param>
/// <param name="MaxInputLevel">The highest level its RF input may receive (analysers): the lower of the bench's and the profile's declarations, or null when neither declares one.</param>
/// <param name="MaxOutputLevel">The highest level it may be set to produce (generators): the lower of the bench's and the profile's declarations.</param>
/// <param name="Location">Where the instrument is declared in the bench file.</param>
public sealed record BenchInstrument(
    string Role,
    InstrumentKind Kind,
    AdapterKind Adapter,
    ConnectionSpec Connection,
    DriverProfile? Profile,
    Level? MaxInputLevel,
    Level? MaxOutputLevel,
    SourceLocation Location);
