namespace BenchRunner.Instruments.Transports;

/// <summary>
/// One fault of a <see cref="FaultScript"/>: what happens, and where in the read stream: in the
/// reply to the <see cref="Reply"/>-th write (1 for the reply to the first command), after
/// <see cref="AfterBytes"/> bytes of that reply have been delivered.
/// </summary>
/// <param name="Kind">What happens.</param>
/// <param name="Reply">Which reply, counted by writes, from 1.</param>
/// <param name="AfterBytes">How many genuine bytes of that reply come before the fault.</param>
/// <param name="Duration">For a stall: how long; null for ever.</param>
/// <param name="Bytes">For garbage: the bytes injected; for babble: the pattern repeated.</param>
/// <param name="Style">For a disconnect: how it shows.</param>
public sealed record ScriptedFault(FaultKind Kind, int Reply, int AfterBytes, TimeSpan? Duration, byte[] Bytes, DisconnectStyle Style);
