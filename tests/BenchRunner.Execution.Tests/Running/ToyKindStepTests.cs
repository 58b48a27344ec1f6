using BenchRunner.Core.Diagnostics;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Runs;
using BenchRunner.Execution.Preparation;
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
    private static readonly PlanVocabulary Vocabulary = PlanVocabulary.BuiltIn.WithKinds(Kinds).WithStep(SetAttenuationStep.SetAttenuator);

    /// <summary>A step of the toy kind: set the attenuation, read it back, judge the read-back.</summary>
    private sealed record SetAttenuationStep(string? Name, SourceLocation Location, string Role, Ratio Attenuation)
        : PlanStep(Name, Location), IInstrumentStep
    {
        public static readonly StepKind SetAttenuator = new("set-attenuator", DrivesInstrument: true) { Read = ReadStep };

        private static readonly string[] Keys = ["role", "attenuation"];

        /// <summary>Reads <c>set-attenuator: { role: att, attenuation: 30 dB }</c>.</summary>
        private static PlanStep? ReadStep(StepReading reading)
        {
            var body = reading.Body(Keys);
            if (body is null)
            {
                return null;
            }

            var role = reading.Role(body, StepAttenuatorKind.Instance);
            var attenuation = body.Parsed("attenuation", Ratio.Parse, "the attenuation to set, e.g. \"30 dB\"");
            return role is null || attenuation is null ? null : new SetAttenuationStep(reading.Name, reading.At, role, attenuation.Value);
        }

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
        var benchPath = dir.Write("bench.yaml", """
            bench: toy-bench
            instruments:
              att:
                kind: step-attenuator
                adapter: profile
                profile: att.yaml
                connection: sim:att
            """);
        var planPath = dir.Write("plan.yaml", """
            plan: toy
            roles: { att: step-attenuator }
            steps:
              - name: thirty
                set-attenuator: { role: att, attenuation: 30 dB }
            """);
        var prepared = RunPreparation.Load(planPath, benchPath, Vocabulary);
        var (host, device) = InMemoryTransport.CreatePair("att");
        var dialect = new Dialect();
        await using var peer = new ScriptedPeer(device, "\n", dialect.Handle);
        var transports = new TransportFactory().Register(ConnectionSpec.SimulatorScheme, _ => host);
        using var store = SqliteResultStore.Open(dir.PathOf("runs.db"));
        var events = new CollectingObserver();

        var outcome = await prepared.Launcher(transports, store)
            .RunAsync(prepared.Plan, prepared.Context("0.1.0", "test-host"), events, CancellationToken.None).WaitAsync(VirtualRuns.Limit);

        Assert.True(outcome.Status == RunStatus.Passed, outcome.Error);
        Assert.Equal(["att 30", "att?"], peer.Received);
        var step = Assert.Single(events.Events.OfType<StepStarted>());
        Assert.Equal(("set-attenuator", true), (step.Kind, step.DrivesInstrument));
        var instrument = Assert.Single(store.GetInstruments(outcome.RunId!.Value));
        Assert.Equal(("att", "step-attenuator", "workshop", "step-att"), (instrument.Role, instrument.Kind, instrument.Maker, instrument.Model));
        var check = Assert.Single(store.GetChecks(outcome.RunId!.Value));
        Assert.Equal("attenuation of att", check.Record.Name);
        Assert.True(check.Record.Passed);
        Assert.Equal(File.ReadAllText(planPath), store.GetRun(outcome.RunId!.Value)!.Record.PlanText);
    }

    [Fact]
    public void Parse_TheToyStepWithAProblem_IsReportedAtItsPlaceByTheKindsReader()
    {
        var error = Assert.Throws<InputFormatException>(() => PlanFile.Parse("""
            plan: toy
            roles: { att: step-attenuator, vna: network-analyser }
            steps:
              - set-attenuator: { role: vna, attenuation: thirty }
            """, "plan.yaml", ".", Vocabulary));

        Assert.Contains(error.Problems, p => p.Location.Line == 4 && p.Detail.Contains("\"set-attenuator\" needs a step-attenuator", StringComparison.Ordinal));
        Assert.Contains(error.Problems, p => p.Location == new SourceLocation("plan.yaml", 4, 47) && p.Detail.Contains("expected a ratio", StringComparison.Ordinal));
    }

    [Fact]
    public void Parse_TheToyStepWithoutItsVocabulary_IsAnUnknownStepAndTheToyKindAnUnknownKind()
    {
        var error = Assert.Throws<InputFormatException>(() => PlanFile.Parse("""
            plan: toy
            roles: { att: step-attenuator }
            steps:
              - set-attenuator: { role: att, attenuation: 30 dB }
            """, "plan.yaml", "."));

        Assert.Contains(error.Problems, p => p.Location.Line == 2 && p.Detail.Contains("unknown value \"step-attenuator\"", StringComparison.Ordinal));
        Assert.Contains(error.Problems, p => p.Location.Line == 4 && p.Detail.Contains("set-attenuator", StringComparison.Ordinal));
    }

    [Fact]
    public void WithStep_AStepWithoutAReaderOrAWordTaken_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => PlanVocabulary.BuiltIn.WithStep(new StepKind("set-attenuator", true)));
        Assert.Throws<ArgumentException>(() => PlanVocabulary.BuiltIn.WithStep(StepKinds.Sweep with { Read = _ => null }));
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
