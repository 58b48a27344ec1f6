using System.Collections.Immutable;
using System.Numerics;

namespace BenchRunner.Simulator.Circuits;

/// <summary>
/// A chain of two-port elements between port 1 and port 2, evaluated by multiplying their ABCD
/// matrices in order and converting the product to S-parameters (Pozar, <i>Microwave
/// Engineering</i>, §4.4 and Table 4.2). Immutable; evaluation does not allocate. An empty chain
/// is a through connection. A network is itself an element, so chains can be nested.
/// </summary>
public sealed class Network : NetworkElement, ITwoPort
{
    private readonly NetworkElement[] _elements;

    /// <summary>Creates the chain, port 1 first.</summary>
    /// <exception cref="ArgumentException">A null element.</exception>
    public Network(params IEnumerable<NetworkElement> elements)
    {
        ArgumentNullException.ThrowIfNull(elements);
        _elements = elements.ToArray();
        if (Array.IndexOf(_elements, null) is var i && i >= 0)
        {
            throw new ArgumentException($"Element {i} is null.", nameof(elements));
        }
    }

    /// <summary>The elements, port 1 first.</summary>
    public ImmutableArray<NetworkElement> Elements => [.. _elements];

    /// <summary>The product of the elements' matrices at <paramref name="hertz"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The frequency is not finite and positive.</exception>
    public override Abcd AbcdAt(double hertz)
    {
        Require.Positive(hertz, nameof(hertz));
        var product = Abcd.Identity;
        foreach (var element in _elements)
        {
            product = product.Cascade(element.AbcdAt(hertz));
        }

        return product;
    }

    /// <inheritdoc/>
    public SParameters Evaluate(double hertz, double referenceOhms)
    {
        var (product, determinant) = ChainAt(hertz);
        return product.ToSParameters(referenceOhms, determinant);
    }

    /// <summary>The product of the elements' matrices and the product of their determinants.</summary>
    internal (Abcd Product, Complex Determinant) ChainAt(double hertz)
    {
        Require.Positive(hertz, nameof(hertz));
        var product = Abcd.Identity;
        var determinant = Complex.One;
        foreach (var element in _elements)
        {
            if (element is Network inner)
            {
                var (innerProduct, innerDeterminant) = inner.ChainAt(hertz);
                product = product.Cascade(innerProduct);
                determinant *= innerDeterminant;
            }
            else
            {
                var link = element.AbcdAt(hertz);
                product = product.Cascade(link);
                determinant *= link.Determinant;
            }
        }

        return (product, determinant);
    }
}
