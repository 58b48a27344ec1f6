using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Instruments.Tests.Kinds.Attenuator;

/// <summary>The toy kind's section of a SCPI command set; in a scpi profile, <c>step-attenuator: {set: ..., query: ...}</c>.</summary>
public sealed class ScpiStepAttenuatorCommands : IScpiCommandSection
{
    /// <inheritdoc/>
    public bool Enabled { get; init; }

    /// <summary>Sets the attenuation in dB. Required. Default <c>ATTenuation {db}</c> (the toy's own words).</summary>
    public string? Set { get; init; } = "ATTenuation {db}";

    /// <summary>Asks for the attenuation in dB. Required. Default <c>ATTenuation?</c>.</summary>
    public string? Query { get; init; } = "ATTenuation?";

    /// <inheritdoc/>
    public bool FetchesTraces => false;

    /// <inheritdoc/>
    public void CollectProblems(ICollection<string> problems)
    {
        ScpiCommandChecks.Check(problems, "attenuator.set", Set, ScpiPlaceholder.Db, required: true);
        ScpiCommandChecks.Check(problems, "attenuator.query", Query, null, required: true, query: true);
    }

    /// <summary>Reads the section of a scpi profile: each command written replaces its default.</summary>
    public static ScpiStepAttenuatorCommands Read(ScpiSectionReader reader)
    {
        var defaults = new ScpiStepAttenuatorCommands();
        var section = reader.Open(["set", "query"]);
        return new ScpiStepAttenuatorCommands
        {
            Enabled = reader.Enabled,
            Set = reader.Command(section, "set", "attenuator.set", defaults.Set),
            Query = reader.Command(section, "query", "attenuator.query", defaults.Query),
        };
    }
}
