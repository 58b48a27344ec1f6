using BenchRunner.Core.Figures;
using BenchRunner.Core.Masks;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Instruments.Adapters;
using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Profiles;
using BenchRunner.Instruments.Transports;
using BenchRunner.Simulator.Endpoints;

namespace BenchRunner.Simulator.Tests.Endpoints;

/// <summary>
/// The project's real clients (SCPI adapter, driver-profile adapter, serial and TCP transports)
/// against the virtual bench's servers, over each kind of endpoint.
/// </summary>
public sealed class VirtualBenchEndToEndTests
{
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(30);
    private static readonly NetworkSweep PreselectorSweep = new(Frequency.FromMegahertz(127.5), Frequency.FromMegahertz(147.5), 401);

    private static DriverProfile Profile(string name) => DriverProfile.Load(RepositoryFiles.Example($"profiles/{name}"));

    private static async Task<ComplexTrace> SweepS21Async(IInstrument instrument)
    {
        await instrument.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var vna = instrument.GetCapability<INetworkAnalyser>()!;
        await vna.ConfigureSweepAsync(PreselectorSweep, CancellationToken.None).WaitAsync(Limit);
        var traces = await vna.AcquireAsync([TraceQuantity.S21], CancellationToken.None).WaitAsync(Limit);
        return Assert.Single(traces);
    }

    private static void AssertTunedPreselector(ComplexTrace s21)
    {
        // The demo board PSF-24-0001 as bundled in docs/examples: centre 137.56 MHz, 3.1 MHz wide, 2.5 dB loss.
        var bandwidth = TraceFigures.Bandwidth(s21).Value;
        Assert.InRange(bandwidth.Centre.Megahertz, 137.45, 137.65);
        Assert.InRange(bandwidth.Width.Megahertz, 2.9, 3.3);
        Assert.InRange(TraceFigures.InsertionLoss(s21).Value, 2.2, 2.8);
        var mask = MaskFile.Load(RepositoryFiles.Example("psf-137-passband.yaml"));
        Assert.True(mask.Evaluate(s21).Passed);
    }

    [Theory]
    [InlineData("sim:vna", "bench-vna-scpi.yaml")]
    [InlineData("sim:vna?dialect=raw", "bench-vna.yaml")]
    public async Task InProcess_EitherDialect_MeasuresTheDemoBoard(string connection, string profile)
    {
        using var stop = new CancellationTokenSource();
        var servers = new VirtualBenchServers(seed: 7);
        var factory = SimulatorConnections.Register(new TransportFactory(), servers, stop.Token);
        await using var instrument = InstrumentAdapterFactory.Create("vna", Profile(profile), ConnectionSpec.Parse(connection).Value, factory);

        var s21 = await SweepS21Async(instrument);

        Assert.Equal("SIM-VNA", instrument.Identity.Model);
        AssertTunedPreselector(s21);
        await stop.CancelAsync();
    }

    [Fact]
    public async Task Tcp_ScpiSpectrumAnalyser_SeesTheGeneratorThroughTheOneDecibelCable()
    {
        using var stop = new CancellationTokenSource();
        var servers = new VirtualBenchServers(seed: 7);
        await using var endpoint = SimulatorTcpEndpoint.Start(servers.Host(SimulatedInstrument.SpectrumAnalyser, SimulatorDialect.Scpi), port: 0, stopping: stop.Token);
        var factory = SimulatorConnections.Register(new TransportFactory(), servers, stop.Token);
        await using var generatorInstrument = InstrumentAdapterFactory.Create("gen", Profile("bench-gen-scpi.yaml"), ConnectionSpec.Parse("sim:gen").Value, factory);
        await using var analyserInstrument = InstrumentAdapterFactory.Create("sa", Profile("bench-sa-scpi.yaml"),
            ConnectionSpec.Parse($"tcp:127.0.0.1:{endpoint.LocalEndpoint.Port}").Value, factory);
        await generatorInstrument.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        await analyserInstrument.ConnectAsync(CancellationToken.None).WaitAsync(Limit);
        var generator = generatorInstrument.GetCapability<ISignalGenerator>()!;
        var analyser = analyserInstrument.GetCapability<ISpectrumAnalyser>()!;

        await generator.SetFrequencyAsync(Frequency.FromMegahertz(140), CancellationToken.None).WaitAsync(Limit);
        await generator.SetLevelAsync(Level.FromDbm(-30), CancellationToken.None).WaitAsync(Limit);
        await generator.SetOutputAsync(true, CancellationToken.None).WaitAsync(Limit);
        await analyser.ConfigureAsync(new SpectrumSettings(
            FrequencyRange.AroundCentre(Frequency.FromMegahertz(140), Frequency.FromMegahertz(1)),
            Frequency.FromKilohertz(10), Ratio.FromDecibels(10), Level.FromDbm(0), 401), CancellationToken.None).WaitAsync(Limit);
        var trace = await analyser.AcquireAsync(CancellationToken.None).WaitAsync(Limit);

        // -30 dBm from the generator less the bench's 1 dB cable (simulator design, docs/simulator-spectrum.md);
        // the parabolic peak refinement recovers the level within a fraction of a dB at a 2.5 kHz bin spacing.
        var peak = TraceFigures.Peak(trace).Value;
        Assert.InRange(peak.Frequency.Megahertz, 139.995, 140.005);
        Assert.InRange(peak.LevelDb, -31.6, -30.4);
        Assert.Equal("SIM-SA", analyserInstrument.Identity.Model);
        await stop.CancelAsync();
    }

    [Theory]
    [InlineData(SimulatorDialect.Raw, "bench-vna.yaml")]
    [InlineData(SimulatorDialect.Scpi, "bench-vna-scpi.yaml")]
    public async Task Tcp_NetworkAnalyser_EitherDialect_MeasuresTheDemoBoard(SimulatorDialect dialect, string profile)
    {
        using var stop = new CancellationTokenSource();
        var servers = new VirtualBenchServers(seed: 7);
        await using var endpoint = SimulatorTcpEndpoint.Start(servers.Host(SimulatedInstrument.NetworkAnalyser, dialect), port: 0, stopping: stop.Token);
        var transport = new TcpTransport(new TcpSettings { Host = "127.0.0.1", Port = endpoint.LocalEndpoint.Port });
        await using var instrument = InstrumentAdapterFactory.Create("vna", Profile(profile), transport);

        AssertTunedPreselector(await SweepS21Async(instrument));
        await stop.CancelAsync();
    }

    [LinuxTheory]
    [InlineData(SimulatorDialect.Raw, "bench-vna.yaml")]
    [InlineData(SimulatorDialect.Scpi, "bench-vna-scpi.yaml")]
    public async Task PseudoTerminal_NetworkAnalyser_EitherDialect_ThroughTheRealSerialPort(SimulatorDialect dialect, string profile)
    {
        using var stop = new CancellationTokenSource();
        var servers = new VirtualBenchServers(seed: 7);
        await using var endpoint = SimulatorPtyEndpoint.Start(servers.Host(SimulatedInstrument.NetworkAnalyser, dialect), "vna", stop.Token);
        var transport = new SerialTransport(new SerialSettings { PortPath = endpoint.Path });
        await using var instrument = InstrumentAdapterFactory.Create("vna", Profile(profile), transport);

        var s21 = await SweepS21Async(instrument);

        AssertTunedPreselector(s21);
        await stop.CancelAsync();
    }

    [Fact]
    public void Resolve_UnknownInstrumentOrDialect_SaysWhatIsOffered()
    {
        var unknown = Assert.Throws<BenchRunner.Instruments.Errors.InstrumentException>(
            () => SimulatorConnections.Resolve(ConnectionSpec.Parse("sim:scope").Value));
        var dialect = Assert.Throws<BenchRunner.Instruments.Errors.InstrumentException>(
            () => SimulatorConnections.Resolve(ConnectionSpec.Parse("sim:vna?dialect=morse").Value));

        Assert.Contains("vna, sa, gen", unknown.Message);
        Assert.Contains("dialect=scpi or dialect=raw", dialect.Message);
    }
}
