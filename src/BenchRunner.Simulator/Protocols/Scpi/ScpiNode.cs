namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>One node of a command tree: a keyword, whether it may be left out, whether it takes a numeric suffix, and its handlers.</summary>
internal sealed class ScpiNode(ScpiKeyword? keyword, bool optional, bool takesSuffix)
{
    /// <summary>The keyword; null for the root.</summary>
    public ScpiKeyword? Keyword { get; } = keyword;

    /// <summary>True when the node is written in brackets and may be left out.</summary>
    public bool Optional { get; } = optional;

    /// <summary>True when the node takes a numeric suffix (1 when omitted).</summary>
    public bool TakesSuffix { get; } = takesSuffix;

    public List<ScpiNode> Children { get; } = [];

    public Action<ScpiCommandContext>? Command { get; set; }

    public Func<ScpiCommandContext, ScpiResponse>? Query { get; set; }

    public bool Handles(bool query) => query ? Query is not null : Command is not null;

    public bool Matches(ScpiMnemonic mnemonic) =>
        Keyword is not null && Keyword.Matches(mnemonic.Name) && (mnemonic.Suffix is null || TakesSuffix);
}
