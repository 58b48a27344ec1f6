using System.Numerics;
using BenchRunner.Core.Traces;

namespace BenchRunner.Simulator.Circuits;

/// <summary>The four linear, unitless S-parameters of a two-port at one frequency.</summary>
/// <param name="S11">Input reflection.</param>
/// <param name="S21">Forward transmission.</param>
/// <param name="S12">Reverse transmission.</param>
/// <param name="S22">Output reflection.</param>
public readonly record struct SParameters(Complex S11, Complex S21, Complex S12, Complex S22)
{
    /// <summary>The parameter named by <paramref name="quantity"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><see cref="TraceQuantity.Power"/>, which is not an S-parameter.</exception>
    public Complex Get(TraceQuantity quantity) => quantity switch
    {
        TraceQuantity.S11 => S11,
        TraceQuantity.S21 => S21,
        TraceQuantity.S12 => S12,
        TraceQuantity.S22 => S22,
        _ => throw new ArgumentOutOfRangeException(nameof(quantity), quantity, "Not an S-parameter."),
    };
}
