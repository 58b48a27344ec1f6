namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>The bits of the IEEE 488.2 Standard Event Status Register (§11.5.1), as <c>*ESR?</c> reports them.</summary>
[Flags]
public enum StandardEventStatus
{
    /// <summary>No event.</summary>
    None = 0,

    /// <summary>OPC (1): operations complete, set by <c>*OPC</c>.</summary>
    OperationComplete = 1,

    /// <summary>RQC (2): request control; never set by the simulator.</summary>
    RequestControl = 2,

    /// <summary>QYE (4): query error, for errors −400 to −499.</summary>
    QueryError = 4,

    /// <summary>DDE (8): device-dependent error, for errors −300 to −399.</summary>
    DeviceDependentError = 8,

    /// <summary>EXE (16): execution error, for errors −200 to −299.</summary>
    ExecutionError = 16,

    /// <summary>CME (32): command error, for errors −100 to −199.</summary>
    CommandError = 32,

    /// <summary>URQ (64): user request; never set by the simulator.</summary>
    UserRequest = 64,

    /// <summary>PON (128): power on; set when the device is created, cleared by <c>*CLS</c> or by reading <c>*ESR?</c>.</summary>
    PowerOn = 128,
}
