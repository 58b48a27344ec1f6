namespace BenchRunner.Simulator.Endpoints;

/// <summary>The virtual bench's instruments, by their short names (<c>vna</c>, <c>sa</c>, <c>gen</c>).</summary>
public enum SimulatedInstrument
{
    /// <summary><c>vna</c>: the network analyser, with the demo preselector board connected.</summary>
    NetworkAnalyser,

    /// <summary><c>sa</c>: the spectrum analyser, seeing the demo scene and the generator.</summary>
    SpectrumAnalyser,

    /// <summary><c>gen</c>: the signal generator, wired to the spectrum analyser through a 1 dB cable.</summary>
    SignalGenerator,
}
