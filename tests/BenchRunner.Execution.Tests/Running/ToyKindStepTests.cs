using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Runs;
using BenchRunner.Execution.Bench;
using BenchRunner.Execution.Plans;
using BenchRunner.Execution.Running;
using BenchRunner.Execution.Tests.Support;
using BenchRunner.Instruments.Connections;
using BenchRunner.Instruments.Kinds;
using BenchRunner.Instruments.Tests.Kinds.Attenuator;
using BenchRunner.Instruments.Tests.Support;
using BenchRunner.Instruments.Transports;
using BenchRunner.Storage.Sqlite;

namespace BenchRunner.Execution.Tests.Running;

/// <summary>
/// The proof that a new instrument kind costs only its own files: the toy step attenuator (defined in
/// the Instruments tests through its descriptor alone) is named in a bench, and a plan step of a kind
/// the runner does not know sets it and judges the read-back, recorded like any run.
/// </summary>
public sealed class ToyKindStepTests
{
    private static readonly InstrumentKindRegistry Kinds = InstrumentKindRegistry.BuiltIn.AddStepAttenuator();
    private static readonly SourceLocation At = SourceLocation.OfFile("built in the test");

    /// <summary>A step of the toy kind: set the attenuation, read it back, judge the read-back.</summary>
    private sealed record SetAttenuationStep(string? Name, SourceLocation Location, string Role, Ratio Attenuation)
        : PlanStep(Name, Location), IInstrumentStep
    {
        public static readonly StepKind SetAttenuator = new("set-attenuator", DrivesInstrument: true);

        public override StepKind Kind => SetAttenuator;

        public async Task RunAsync(StepServices services, CancellationToken cancellationToken)
        {
            var attenuator = services.Capability<IStepAttenuator>(Role);
            await attenuator.SetAttenuationAsync(Attenuation, cancellationToken);
            var read = await attenuator.ReadAttenuationAsync(cancellationToken);
            var error = read.Decibels - Attenuation.Decibels;
            await services.RecordCheckAsync(new CheckResult(services.StepName, $"attenuation of {Role}", Math.Abs(error) < 0.5,
                $"read back {read.Decibels} dB; set {Attenuation.Decibels} dB", 0.5 - Math.Abs(error), "dB"));
        }
    }

    [Fact]
    public async Task Run_AStepOfAToyKind_DrivesItThroughItsDescriptorAndIsRecorded()
    {
        using var dir = new TempDirectory();
        dir.Write("att.yaml", """
            profile: bench-att
            kinds: [step-attenuator]
            identity: {maker: workshop, model: step-att}
            limits: {max-input-level: 20 dBm}
            step-attenuator:
              set: att {attenuation:db}
              query: att?
              reply: '^att (?<db>\d+)$'
            """);
        var bench = BenchFile.Parse("""
            bench: toy-bench
            instruments:
              att:
                kind: step-attenuator
                adapter: profile
                profile: att.yaml
                connection: sim:att
            """, "bench.yaml", dir.Path, Kinds);
        var (host, device) = InMemoryTransport.CreatePair("att");
        var dialect = new Dialect();
        await using var peer = new ScriptedPeer(device, "\n", dialect.Handle);
        var transports = new TransportFactory().Register(ConnectionSpec.SimulatorScheme, _ => host);
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var plan = new TestPlan("toy", null, [new RoleRequirement("att", StepAttenuatorKind.Instance, At)],
            [new SetAttenuationStep("thirty", At, "att", Ratio.FromDecibels(30))], "built in the test");
        var events = new CollectingObserver();

        var outcome = await new RunLauncher(new PlanRunner(bench, transports), store)
            .RunAsync(plan, VirtualRuns.Context(), events, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.True(outcome.Status == RunStatus.Passed, outcome.Error);
        Assert.Equal(["att 30", "att?"], peer.Received);
        var step = Assert.Single(events.Events.OfType<StepStarted>());
        Assert.Equal(("set-attenuator", true), (step.Kind, step.DrivesInstrument));
        var instrument = Assert.Single(store.GetInstruments(outcome.RunId!.Value));
        Assert.Equal(("att", "step-attenuator", "workshop", "step-att"), (instrument.Role, instrument.Kind, instrument.Maker, instrument.Model));
        var check = Assert.Single(store.GetChecks(outcome.RunId!.Value));
        Assert.Equal("attenuation of att", check.Record.Name);
        Assert.True(check.Record.Passed);
    }

    private sealed class Dialect
    {
        private string _db = "0";

        public IReadOnlyList<string> Handle(string line)
        {
            if (line == "att?")
            {
                return [$"att {_db}"];
            }

            if (line.StartsWith("att ", StringComparison.Ordinal))
            {
                _db = line[4..];
            }

            return [];
        }
    }
}
