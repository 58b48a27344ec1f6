namespace BenchRunner.Core.Traces;

/// <summary>How the points of a <see cref="FrequencyAxis"/> were laid out.</summary>
public enum FrequencyAxisKind
{
    /// <summary>Equally spaced in frequency from start to stop, both ends included.</summary>
    Linear,

    /// <summary>Equally spaced in log(frequency) from start to stop, both ends included.</summary>
    Logarithmic,

    /// <summary>An explicit, strictly increasing list of frequencies.</summary>
    List,
}
