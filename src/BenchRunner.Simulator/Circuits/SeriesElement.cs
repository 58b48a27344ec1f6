namespace BenchRunner.Simulator.Circuits;

/// <summary>A two-terminal part in series between the ports: [[1, Z], [0, 1]].</summary>
public sealed class SeriesElement : NetworkElement
{
    /// <summary>Places <paramref name="part"/> in series.</summary>
    public SeriesElement(TwoTerminal part) => Part = part ?? throw new ArgumentNullException(nameof(part));

    /// <summary>The part.</summary>
    public TwoTerminal Part { get; }

    /// <inheritdoc/>
    public override Abcd AbcdAt(double hertz) => Abcd.Series(Part.ImpedanceAt(hertz));
}
