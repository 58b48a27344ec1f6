using BenchRunner.Core.Quantities;
using BenchRunner.Simulator.Protocols.Hosting;

namespace BenchRunner.Simulator.Protocols.Raw;

/// <summary>
/// The bench signal generator's raw dialect (docs/simulator-dialect.md, "Signal generator"):
/// commands end with CR (CR LF is taken too); no prompt and no echo; every accepted command is
/// answered <c>ok</c> (<c>who</c> by the identity line), a refused one by its <c>err</c> line.
/// Commands: <c>who</c>, <c>tone &lt;mhz&gt;</c> (up to 6 decimals), <c>lvl &lt;dbm&gt;</c> (up to 3
/// decimals), <c>rf on</c> and <c>rf off</c>.
/// </summary>
public sealed class BenchGenServer : IDeviceProtocol
{
    /// <summary>The reply to an accepted setting.</summary>
    public const string Acknowledgement = "ok";

    private readonly ISimulatedSignalGenerator _device;

    /// <summary>Serves <paramref name="device"/>.</summary>
    public BenchGenServer(ISimulatedSignalGenerator device)
    {
        ArgumentNullException.ThrowIfNull(device);
        _device = device;
    }

    /// <inheritdoc/>
    public CommandLineEnd LineEnd => CommandLineEnd.CarriageReturnOrLineFeed;

    /// <inheritdoc/>
    public byte[] Handle(string line) => BenchDialect.Answer(line, words => [Run(words)], echo: false, prompt: null);

    /// <inheritdoc/>
    public byte[] HandleOverlongLine(int limitBytes) => BenchDialect.AnswerOverlong(prompt: null);

    private string Run(string[] words)
    {
        var ranges = _device.Ranges;
        switch (words[0])
        {
            case "who":
                BenchDialect.ExpectArguments(words, 0);
                return BenchDialect.IdentityLine(_device.Identity);
            case "tone":
                BenchDialect.ExpectArguments(words, 1);
                // Megahertz with up to six decimals is whole hertz: the range's 1 Hz step checks both.
                var hertz = BenchDialect.Within(BenchDialect.Scaled(BenchDialect.Number(words[1]), 1_000_000m), ranges.FrequencyHertz);
                _device.SetFrequency(Frequency.FromHertz(hertz));
                return Acknowledgement;
            case "lvl":
                BenchDialect.ExpectArguments(words, 1);
                _device.SetLevel(Level.FromDbm(BenchDialect.Within(BenchDialect.Number(words[1]), ranges.LevelDbm)));
                return Acknowledgement;
            case "rf":
                BenchDialect.ExpectArguments(words, 1);
                _device.SetOutput(words[1] switch
                {
                    "on" => true,
                    "off" => false,
                    _ => throw new BenchDialectException(BenchDialectError.ValueOutOfRange),
                });
                return Acknowledgement;
            default:
                throw new BenchDialectException(BenchDialectError.UnknownCommand);
        }
    }
}
