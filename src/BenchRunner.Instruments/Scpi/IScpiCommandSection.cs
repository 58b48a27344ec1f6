namespace BenchRunner.Instruments.Scpi;

/// <summary>
/// One kind's part of a <see cref="ScpiCommandSet"/>: the commands a SCPI instrument is sent for that
/// capability (<see cref="ScpiNetworkCommands"/>, <see cref="ScpiSpectrumCommands"/>,
/// <see cref="ScpiGeneratorCommands"/>, or a registered kind's own).
/// </summary>
public interface IScpiCommandSection
{
    /// <summary>Whether the instrument has this capability; a disabled section is neither checked nor built.</summary>
    bool Enabled { get; }

    /// <summary>True when the capability fetches traces, so the set's trigger, data format and byte order are needed.</summary>
    bool FetchesTraces { get; }

    /// <summary>
    /// Adds every problem of the section to <paramref name="problems"/>, each as <c>where: what</c>
    /// (e.g. <c>network.start: a command is required</c>); <see cref="ScpiCommandChecks.Check"/> does the usual checks.
    /// </summary>
    void CollectProblems(ICollection<string> problems);
}
