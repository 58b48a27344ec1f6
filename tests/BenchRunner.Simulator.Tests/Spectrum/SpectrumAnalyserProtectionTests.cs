using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Spectrum;

namespace BenchRunner.Simulator.Tests.Spectrum;

public class SpectrumAnalyserProtectionTests
{
    [Fact]
    public void InputStatus_NothingConnected_NoPowerAndNoFlags()
    {
        var analyser = new SimulatedSpectrumAnalyser(1);

        var status = analyser.InputStatus;

        Assert.Null(status.TotalInput);
        Assert.False(status.AboveMaximum);
        Assert.False(status.AboveDamageLevel);
    }

    [Fact]
    public void InputStatus_SumsThePowerOfAllSignalsWhateverTheirFrequency()
    {
        // Two +18 dBm carriers far apart: 2 × 63.1 mW = +21.01 dBm at the connector, above the
        // declared +20 dBm, though neither alone is.
        var analyser = AnalyserWith(
            Emission.Cw(Frequency.FromMegahertz(50), Level.FromDbm(18)),
            Emission.Cw(Frequency.FromMegahertz(900), Level.FromDbm(18)));

        var status = analyser.InputStatus;

        Assert.Equal(18 + 10 * Math.Log10(2), status.TotalInput!.Value.Dbm, 9);
        Assert.True(status.AboveMaximum);
        Assert.False(status.AboveDamageLevel);
    }

    [Fact]
    public void Sweep_AboveTheMaximum_LatchesTheOverloadFlagUntilCleared()
    {
        var signal = new MutableSource(Emission.Cw(Frequency.FromMegahertz(137.5), Level.FromDbm(21)));
        var analyser = new SimulatedSpectrumAnalyser(1);
        analyser.Connect(signal);

        analyser.Sweep();
        signal.Current = Emission.Cw(Frequency.FromMegahertz(137.5), Level.FromDbm(-20));
        analyser.Sweep();

        Assert.True(analyser.InputOverloadSeen);
        Assert.False(analyser.DamageLevelSeen);
        analyser.ClearInputFlags();
        analyser.Sweep();
        Assert.False(analyser.InputOverloadSeen);
    }

    [Fact]
    public void Sweep_AboveTheDamageLevel_SetsBothFlags()
    {
        var analyser = AnalyserWith(Emission.Cw(Frequency.FromMegahertz(137.5), Level.FromDbm(31)));

        analyser.Sweep();

        Assert.True(analyser.InputOverloadSeen);
        Assert.True(analyser.DamageLevelSeen);
        Assert.True(analyser.InputStatus.AboveDamageLevel);
    }

    [Fact]
    public void Sweep_AtTheMaximum_RaisesNoFlag()
    {
        var analyser = AnalyserWith(Emission.Cw(Frequency.FromMegahertz(137.5), Level.FromDbm(20)));

        analyser.Sweep();

        Assert.False(analyser.InputOverloadSeen);
        Assert.False(analyser.InputStatus.AboveMaximum);
    }

    private static SimulatedSpectrumAnalyser AnalyserWith(params Emission[] emissions)
    {
        var analyser = new SimulatedSpectrumAnalyser(1);
        analyser.Connect(new Scene(emissions.Select((e, i) => new SceneSignal($"signal {i}", e))));
        return analyser;
    }

    private sealed class MutableSource(Emission initial) : ISignalSource
    {
        public Emission Current { get; set; } = initial;

        public IEnumerable<Emission> Emissions() => [Current];
    }
}
