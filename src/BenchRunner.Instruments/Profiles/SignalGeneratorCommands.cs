namespace BenchRunner.Instruments.Profiles;

/// <summary>A profile's signal generator commands (<c>signal-generator:</c>).</summary>
public sealed class SignalGeneratorCommands
{
    internal SignalGeneratorCommands(CommandTemplate frequency, CommandTemplate level, CommandTemplate output)
    {
        Frequency = frequency;
        Level = level;
        Output = output;
    }

    /// <summary>Sets the carrier frequency (<c>{frequency}</c>).</summary>
    public CommandTemplate Frequency { get; }

    /// <summary>Sets the output level (<c>{level}</c>).</summary>
    public CommandTemplate Level { get; }

    /// <summary>Switches the output (<c>{output}</c>).</summary>
    public CommandTemplate Output { get; }
}
