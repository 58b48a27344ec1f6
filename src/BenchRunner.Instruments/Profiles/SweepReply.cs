using System.Collections.Immutable;
using System.Numerics;

namespace BenchRunner.Instruments.Profiles;

/// <summary>The points read from one sweep reply, before they are put on a frequency axis.</summary>
public sealed class SweepReply
{
    internal SweepReply(ImmutableArray<double> frequenciesHertz, ImmutableArray<Complex> samples, ImmutableArray<double> levelsDbm)
    {
        FrequenciesHertz = frequenciesHertz;
        Samples = samples;
        LevelsDbm = levelsDbm;
    }

    /// <summary>The frequencies the device reported, in hertz; empty when the grammar has no frequency column.</summary>
    public ImmutableArray<double> FrequenciesHertz { get; }

    /// <summary>The S-parameter samples (linear, complex); empty for a power reply.</summary>
    public ImmutableArray<Complex> Samples { get; }

    /// <summary>The power levels in dBm; empty for an S-parameter reply.</summary>
    public ImmutableArray<double> LevelsDbm { get; }

    /// <summary>The number of points.</summary>
    public int Count => Samples.IsEmpty ? LevelsDbm.Length : Samples.Length;
}
