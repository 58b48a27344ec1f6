using BenchRunner.Instruments.Scpi;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The standard error-queue entries the simulated SCPI instruments report, numbers and texts as in
/// SCPI-1999 Vol 2 §21.8. The class is given by the number: −100 to −199 command errors, −200 to
/// −299 execution errors, −300 to −399 device-specific errors, −400 to −499 query errors.
/// </summary>
public static class ScpiStandardErrors
{
    /// <summary>−100 "Command error": a command error of no more specific kind (here: a line longer than the device accepts).</summary>
    public static readonly ScpiError CommandError = new(-100, "Command error");

    /// <summary>−102 "Syntax error": an unrecognised character or element in the program message.</summary>
    public static readonly ScpiError SyntaxError = new(-102, "Syntax error");

    /// <summary>−104 "Data type error": a parameter of another type than allowed (a word where a number belongs).</summary>
    public static readonly ScpiError DataTypeError = new(-104, "Data type error");

    /// <summary>−108 "Parameter not allowed": more parameters than the header takes.</summary>
    public static readonly ScpiError ParameterNotAllowed = new(-108, "Parameter not allowed");

    /// <summary>−109 "Missing parameter": fewer parameters than the header needs.</summary>
    public static readonly ScpiError MissingParameter = new(-109, "Missing parameter");

    /// <summary>−113 "Undefined header": a header the device does not know.</summary>
    public static readonly ScpiError UndefinedHeader = new(-113, "Undefined header");

    /// <summary>−114 "Header suffix out of range": a numeric suffix the node does not have (from memory).</summary>
    public static readonly ScpiError HeaderSuffixOutOfRange = new(-114, "Header suffix out of range");

    /// <summary>−131 "Invalid suffix": a unit that does not fit the parameter, such as <c>DBM</c> for a frequency (from memory).</summary>
    public static readonly ScpiError InvalidSuffix = new(-131, "Invalid suffix");

    /// <summary>−138 "Suffix not allowed": a unit on a parameter that has none, such as a number of points (from memory).</summary>
    public static readonly ScpiError SuffixNotAllowed = new(-138, "Suffix not allowed");

    /// <summary>−200 "Execution error": the command could not be carried out, for no more specific reason.</summary>
    public static readonly ScpiError ExecutionError = new(-200, "Execution error");

    /// <summary>−221 "Settings conflict": a valid value that does not fit the other settings (from memory).</summary>
    public static readonly ScpiError SettingsConflict = new(-221, "Settings conflict");

    /// <summary>−222 "Data out of range": a value outside the setting's range.</summary>
    public static readonly ScpiError DataOutOfRange = new(-222, "Data out of range");

    /// <summary>−224 "Illegal parameter value": a word that is none of the setting's choices (from memory).</summary>
    public static readonly ScpiError IllegalParameterValue = new(-224, "Illegal parameter value");

    /// <summary>−230 "Data corrupt or stale": trace data asked for before a sweep with the present settings (from memory).</summary>
    public static readonly ScpiError DataStale = new(-230, "Data corrupt or stale");

    /// <summary>−350 "Queue overflow": put in place of the newest entry when the queue is full.</summary>
    public static readonly ScpiError QueueOverflow = new(-350, "Queue overflow");

    /// <summary>−410 "Query INTERRUPTED": a new command came before the previous response was read (IEEE 488.2 §6.3.2.3).</summary>
    public static readonly ScpiError QueryInterrupted = new(-410, "Query INTERRUPTED");

    /// <summary>−420 "Query UNTERMINATED": a response was asked for when no complete query had been received (IEEE 488.2 §6.3.2.2).</summary>
    public static readonly ScpiError QueryUnterminated = new(-420, "Query UNTERMINATED");

    /// <summary>True for command errors (−100 to −199), after which the rest of the program message is skipped.</summary>
    public static bool IsCommandError(ScpiError error) => error.Code is <= -100 and > -200;
}
