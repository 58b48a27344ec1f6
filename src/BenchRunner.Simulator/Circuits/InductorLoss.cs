namespace BenchRunner.Simulator.Circuits;

/// <summary>How an <see cref="Inductor"/>'s series loss resistance depends on frequency.</summary>
public enum InductorLoss
{
    /// <summary>No loss: an ideal inductor.</summary>
    None,

    /// <summary>The same Q at every frequency: R = ω·L/Q.</summary>
    ConstantQ,

    /// <summary>
    /// Q given at one frequency; the loss resistance grows as √f (skin effect), so Q grows as √f.
    /// </summary>
    SkinEffect,
}
