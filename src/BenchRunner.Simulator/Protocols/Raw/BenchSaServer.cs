using System.Globalization;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Protocols.Hosting;

namespace BenchRunner.Simulator.Protocols.Raw;

/// <summary>
/// The bench spectrum analyser's raw dialect (docs/simulator-dialect.md, "Spectrum analyser"):
/// commands end with LF; no echo; every reply is followed by the prompt <c>br-sa> </c>. Commands:
/// <c>who</c>, <c>span &lt;start&gt; &lt;stop&gt;</c>, <c>rbw &lt;hz&gt;</c>, <c>att &lt;db&gt;</c>,
/// <c>ref &lt;dbm&gt;</c>, <c>pts &lt;n&gt;</c>, <c>go</c> and <c>trace</c>, which answers every point's
/// level in hundredths of a dBm on one line. A refused command is answered by its <c>err</c> line and
/// changes nothing.
/// </summary>
public sealed class BenchSaServer : IDeviceProtocol
{
    /// <summary>The prompt written after every reply: <c>br-sa> </c>.</summary>
    public const string Prompt = "br-sa> ";

    private readonly ISimulatedSpectrumAnalyser _device;
    private PowerTrace? _lastSweep;

    /// <summary>Serves <paramref name="device"/>.</summary>
    public BenchSaServer(ISimulatedSpectrumAnalyser device)
    {
        ArgumentNullException.ThrowIfNull(device);
        _device = device;
    }

    /// <inheritdoc/>
    public CommandLineEnd LineEnd => CommandLineEnd.LineFeed;

    /// <inheritdoc/>
    public byte[] Handle(string line) => BenchDialect.Answer(line, Run, echo: false, Prompt);

    /// <inheritdoc/>
    public byte[] HandleOverlongLine(int limitBytes) => BenchDialect.AnswerOverlong(Prompt);

    private IReadOnlyList<string> Run(string[] words)
    {
        var ranges = _device.Ranges;
        switch (words[0])
        {
            case "who":
                BenchDialect.ExpectArguments(words, 0);
                return [BenchDialect.IdentityLine(_device.Identity)];
            case "span":
                BenchDialect.ExpectArguments(words, 2);
                var (start, stop) = (BenchDialect.Number(words[1]), BenchDialect.Number(words[2]));
                var startHertz = BenchDialect.Within(start, ranges.StartHertz);
                var stopHertz = BenchDialect.Within(stop, ranges.StopHertz);
                if (stopHertz <= startHertz)
                {
                    throw new BenchDialectException(BenchDialectError.ValueOutOfRange);
                }

                return Setting(() => _device.SetSpan(Frequency.FromHertz(startHertz), Frequency.FromHertz(stopHertz)));
            case "rbw":
                BenchDialect.ExpectArguments(words, 1);
                var rbw = BenchDialect.Within(BenchDialect.Number(words[1]), ranges.ResolutionBandwidthHertz);
                return Setting(() => _device.SetResolutionBandwidth(Frequency.FromHertz(rbw)));
            case "att":
                BenchDialect.ExpectArguments(words, 1);
                var att = BenchDialect.Within(BenchDialect.Number(words[1]), ranges.InputAttenuationDb);
                return Setting(() => _device.SetInputAttenuation(Ratio.FromDecibels(att)));
            case "ref":
                BenchDialect.ExpectArguments(words, 1);
                var reference = BenchDialect.Within(BenchDialect.Number(words[1]), ranges.ReferenceLevelDbm);
                return Setting(() => _device.SetReferenceLevel(Level.FromDbm(reference)));
            case "pts":
                BenchDialect.ExpectArguments(words, 1);
                var points = BenchDialect.Within(BenchDialect.Number(words[1]), ranges.Points);
                return Setting(() => _device.SetPoints((int)points));
            case "go":
                BenchDialect.ExpectArguments(words, 0);
                _lastSweep = _device.Sweep();
                return [];
            case "trace":
                BenchDialect.ExpectArguments(words, 0);
                var trace = _lastSweep ?? throw new BenchDialectException(BenchDialectError.NoSweep);
                return [string.Join(",", trace.LevelsDb.Select(Hundredths))];
            default:
                throw new BenchDialectException(BenchDialectError.UnknownCommand);
        }
    }

    // Any accepted setting makes the last sweep stale: "trace" needs a "go" since the last setting.
    private string[] Setting(Action apply)
    {
        apply();
        _lastSweep = null;
        return [];
    }

    private static string Hundredths(double dbm) =>
        ((long)Math.Round(dbm * 100, MidpointRounding.AwayFromZero)).ToString(CultureInfo.InvariantCulture);
}
