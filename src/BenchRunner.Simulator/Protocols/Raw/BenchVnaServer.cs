using System.Globalization;
using BenchRunner.Core.Quantities;
using BenchRunner.Core.Traces;
using BenchRunner.Simulator.Protocols.Hosting;

namespace BenchRunner.Simulator.Protocols.Raw;

/// <summary>
/// The bench network analyser's raw dialect (docs/simulator-dialect.md, "Network analyser"): commands
/// end with LF; every command line is echoed with CR LF, then its reply, then the prompt
/// <c>br-vna> </c>. Commands: <c>who</c>, <c>band &lt;start&gt; &lt;stop&gt; &lt;points&gt;</c>,
/// <c>ifbw &lt;hz&gt;</c>, <c>avg &lt;n&gt;</c>, <c>go</c>, <c>data s11</c> and <c>data s21</c>. A refused
/// command is answered by its <c>err</c> line and changes nothing.
/// </summary>
public sealed class BenchVnaServer : IDeviceProtocol
{
    /// <summary>The prompt written after every reply: <c>br-vna> </c>, with its space and no line end.</summary>
    public const string Prompt = "br-vna> ";

    private readonly ISimulatedNetworkAnalyser _device;
    private bool _bandSet;
    private TraceSet? _lastSweep;

    /// <summary>Serves <paramref name="device"/>; no band is set until the host sends one.</summary>
    public BenchVnaServer(ISimulatedNetworkAnalyser device)
    {
        ArgumentNullException.ThrowIfNull(device);
        _device = device;
    }

    /// <inheritdoc/>
    public CommandLineEnd LineEnd => CommandLineEnd.LineFeed;

    /// <inheritdoc/>
    public byte[] Handle(string line) => BenchDialect.Answer(line, Run, echo: true, Prompt);

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
            case "band":
                BenchDialect.ExpectArguments(words, 3);
                var (start, stop, points) = (BenchDialect.Number(words[1]), BenchDialect.Number(words[2]), BenchDialect.Number(words[3]));
                var startHertz = BenchDialect.Within(start, ranges.StartHertz);
                var stopHertz = BenchDialect.Within(stop, ranges.StopHertz);
                var count = BenchDialect.Within(points, ranges.Points);
                if (stopHertz <= startHertz)
                {
                    throw new BenchDialectException(BenchDialectError.ValueOutOfRange);
                }

                _device.SetSweep(Frequency.FromHertz(startHertz), Frequency.FromHertz(stopHertz), (int)count);
                _bandSet = true;
                _lastSweep = null;
                return [];
            case "ifbw":
                BenchDialect.ExpectArguments(words, 1);
                _device.SetIfBandwidth(Frequency.FromHertz(BenchDialect.Within(BenchDialect.Number(words[1]), ranges.IfBandwidthHertz)));
                return [];
            case "avg":
                BenchDialect.ExpectArguments(words, 1);
                _device.SetAverages((int)BenchDialect.Within(BenchDialect.Number(words[1]), ranges.Averages));
                return [];
            case "go":
                BenchDialect.ExpectArguments(words, 0);
                if (!_bandSet)
                {
                    throw new BenchDialectException(BenchDialectError.NoSweep);
                }

                _lastSweep = _device.Sweep();
                return [];
            case "data":
                BenchDialect.ExpectArguments(words, 1);
                var quantity = words[1] switch
                {
                    "s11" => TraceQuantity.S11,
                    "s21" => TraceQuantity.S21,
                    _ => throw new BenchDialectException(BenchDialectError.ValueOutOfRange),
                };
                return _lastSweep?.Find(quantity) is ComplexTrace trace
                    ? Data(words[1], trace)
                    : throw new BenchDialectException(BenchDialectError.NoSweep);
            default:
                throw new BenchDialectException(BenchDialectError.UnknownCommand);
        }
    }

    // "# s21 201", then "<hertz> <re> <im>" per point: whole hertz, seven significant digits.
    private static List<string> Data(string parameter, ComplexTrace trace)
    {
        var lines = new List<string>(trace.Count + 1) { string.Create(CultureInfo.InvariantCulture, $"# {parameter} {trace.Count}") };
        for (int i = 0; i < trace.Count; i++)
        {
            var hertz = (long)Math.Round(trace.Axis.Hertz[i], MidpointRounding.AwayFromZero);
            // Adding 0.0 turns a negative zero into zero, so it is not printed as "-0.000000E+00".
            var (re, im) = (trace.Samples[i].Real + 0.0, trace.Samples[i].Imaginary + 0.0);
            lines.Add(string.Create(CultureInfo.InvariantCulture, $"{hertz} {re:0.000000E+00} {im:0.000000E+00}"));
        }

        return lines;
    }
}
