namespace BenchRunner.Simulator.Protocols.Raw;

/// <summary>The error codes of the bench dialect (docs/simulator-dialect.md), sent as <c>err &lt;code&gt; &lt;text&gt;</c>.</summary>
public enum BenchDialectError
{
    /// <summary>1 <c>unknown command</c>: the first word is not a command of this instrument (or the line was too long to be one).</summary>
    UnknownCommand = 1,

    /// <summary>2 <c>wrong number of arguments</c>: too few or too many words after the command.</summary>
    WrongNumberOfArguments = 2,

    /// <summary>3 <c>value out of range</c>: a value outside the command's range (or finer than its resolution).</summary>
    ValueOutOfRange = 3,

    /// <summary>4 <c>not a number</c>: an argument that should be a number is not.</summary>
    NotANumber = 4,

    /// <summary>5 <c>no sweep</c>: data asked for before a sweep was made (or after the settings changed).</summary>
    NoSweep = 5,
}
