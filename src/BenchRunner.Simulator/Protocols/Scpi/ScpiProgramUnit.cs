namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>One program message unit: a header, whether it is a query, and its parameters (IEEE 488.2 §7.3).</summary>
/// <param name="Header">The header as received, with any <c>?</c>, e.g. <c>SENS:FREQ:STAR</c>.</param>
/// <param name="IsCommon">True for a common command (<c>*IDN?</c>); its name is then the one mnemonic.</param>
/// <param name="IsRooted">True when the header starts with a colon, so it is looked up from the root.</param>
/// <param name="Mnemonics">The keywords of the header, in order.</param>
/// <param name="IsQuery">True when the header ends with <c>?</c>.</param>
/// <param name="Parameters">The parameters, in order.</param>
internal sealed record ScpiProgramUnit(
    string Header,
    bool IsCommon,
    bool IsRooted,
    IReadOnlyList<ScpiMnemonic> Mnemonics,
    bool IsQuery,
    IReadOnlyList<ScpiParameter> Parameters);
