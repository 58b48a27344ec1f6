using BenchRunner.Core.Quantities;

namespace BenchRunner.Simulator.Protocols.Scpi;

/// <summary>
/// The SCPI commands of a simulated signal generator, matching the defaults of the project's SCPI
/// client (<c>ScpiCommandSet</c>) and described in docs/simulator-protocols.md:
/// <c>[SOURce#]:FREQuency[:CW]</c>, <c>[SOURce#]:POWer[:LEVel][:IMMediate][:AMPLitude]</c> in dBm,
/// <c>OUTPut#[:STATe]</c>, <c>*IDN?</c> and <c>*RST</c> (output off, lowest level).
/// </summary>
public static class SignalGeneratorScpiTree
{
    /// <summary>A SCPI server for <paramref name="device"/>, with its own error queue (or <paramref name="status"/>).</summary>
    public static ScpiServer CreateServer(ISimulatedSignalGenerator device, ScpiDeviceStatus? status = null)
    {
        ArgumentNullException.ThrowIfNull(device);
        var tree = new ScpiCommandTree()
            .Identification(device.Identity)
            .Command("*RST", c =>
            {
                c.ExpectParameters(0, 0);
                device.Reset();
            })
            .NumberSetting("[SOURce#]:FREQuency[:CW]", ScpiUnit.Hertz, () => device.Ranges.FrequencyHertz,
                () => device.Frequency.Hertz, hertz => device.SetFrequency(Frequency.FromHertz(hertz)))
            .NumberSetting("[SOURce#]:POWer[:LEVel][:IMMediate][:AMPLitude]", ScpiUnit.DecibelMilliwatt, () => device.Ranges.LevelDbm,
                () => device.Level.Dbm, dbm => device.SetLevel(Level.FromDbm(dbm)))
            .SwitchSetting("OUTPut#[:STATe]", () => device.OutputOn, device.SetOutput);
        return new ScpiServer(tree, status);
    }
}
