namespace BenchRunner.Core.Traces;

/// <summary>The unit of a trace's <see cref="Trace.LevelsDb"/>.</summary>
public enum TraceUnit
{
    /// <summary>Decibels of a ratio (S-parameters): 20·log10|S|.</summary>
    Decibel,

    /// <summary>Decibels relative to one milliwatt (power traces).</summary>
    DecibelMilliwatt,
}
