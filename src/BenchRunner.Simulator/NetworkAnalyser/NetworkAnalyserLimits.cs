using BenchRunner.Core.Quantities;
using BenchRunner.Instruments.Capabilities;

namespace BenchRunner.Simulator.NetworkAnalyser;

/// <summary>
/// What the simulated network analyser accepts. The figures are the simulator's own invention,
/// in the range of a low-cost bench analyser. Defaults in each property's description.
/// </summary>
public sealed record NetworkAnalyserLimits
{
    /// <summary>The lowest sweep frequency; 1 MHz by default.</summary>
    public Frequency MinimumFrequency { get; init; } = Frequency.FromMegahertz(1);

    /// <summary>The highest sweep frequency; 1.5 GHz by default.</summary>
    public Frequency MaximumFrequency { get; init; } = Frequency.FromGigahertz(1.5);

    /// <summary>The fewest points in a sweep; 11 by default.</summary>
    public int MinimumPoints { get; init; } = 11;

    /// <summary>The most points in a sweep; 10 001 by default.</summary>
    public int MaximumPoints { get; init; } = 10_001;

    /// <summary>The narrowest IF bandwidth; 10 Hz by default.</summary>
    public Frequency MinimumIfBandwidth { get; init; } = Frequency.FromHertz(10);

    /// <summary>The widest IF bandwidth; 100 kHz by default.</summary>
    public Frequency MaximumIfBandwidth { get; init; } = Frequency.FromKilohertz(100);

    /// <summary>The most sweeps averaged; 1000 by default.</summary>
    public int MaximumAverages { get; init; } = 1000;

    /// <summary>The test-port output level (fixed); −10 dBm by default.</summary>
    public Level PortPower { get; init; } = Level.FromDbm(-10);

    /// <summary>The highest level a test port tolerates without damage; +20 dBm by default.</summary>
    public Level MaximumInputLevel { get; init; } = Level.FromDbm(20);

    /// <summary>The limits of the default simulated analyser.</summary>
    public static NetworkAnalyserLimits Default { get; } = new();

    /// <summary>The same limits in the form the runner checks plans against.</summary>
    public InstrumentLimits ToInstrumentLimits() => new(
        FrequencyRange.Between(MinimumFrequency, MaximumFrequency),
        MaxInputLevel: MaximumInputLevel,
        MaxOutputLevel: PortPower,
        MinOutputLevel: PortPower);

    /// <summary>Every way in which <paramref name="sweep"/> breaks these limits; empty when it keeps them.</summary>
    public IReadOnlyList<string> Check(NetworkSweep sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        var problems = new List<string>();
        if (sweep.Start < MinimumFrequency)
        {
            problems.Add($"the start {sweep.Start} is below the lowest frequency, {MinimumFrequency}");
        }

        if (sweep.Stop > MaximumFrequency)
        {
            problems.Add($"the stop {sweep.Stop} is above the highest frequency, {MaximumFrequency}");
        }

        if (sweep.Points < MinimumPoints || sweep.Points > MaximumPoints)
        {
            problems.Add($"{sweep.Points} points is outside {MinimumPoints} to {MaximumPoints}");
        }

        if (sweep.IfBandwidth is { } ifbw && (ifbw < MinimumIfBandwidth || ifbw > MaximumIfBandwidth))
        {
            problems.Add($"the IF bandwidth {ifbw} is outside {MinimumIfBandwidth} to {MaximumIfBandwidth}");
        }

        if (sweep.Averages is { } averages && averages > MaximumAverages)
        {
            problems.Add($"{averages} averages is more than {MaximumAverages}");
        }

        return problems;
    }
}
