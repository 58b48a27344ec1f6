namespace BenchRunner.Simulator.Circuits;

/// <summary>A two-terminal part from the line to ground: [[1, 0], [Y, 1]].</summary>
public sealed class ShuntElement : NetworkElement
{
    /// <summary>Places <paramref name="part"/> across the line.</summary>
    public ShuntElement(TwoTerminal part) => Part = part ?? throw new ArgumentNullException(nameof(part));

    /// <summary>The part.</summary>
    public TwoTerminal Part { get; }

    /// <inheritdoc/>
    public override Abcd AbcdAt(double hertz) => Abcd.Shunt(Part.AdmittanceAt(hertz));
}
