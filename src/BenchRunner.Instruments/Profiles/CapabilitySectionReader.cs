using BenchRunner.Core.Traces;
using BenchRunner.Core.Yaml;
using static BenchRunner.Instruments.Profiles.DriverProfileKeys;

namespace BenchRunner.Instruments.Profiles;

/// <summary>Reads the raw-profile sections of the built-in kinds, each opened by its kind's <see cref="ProfileSectionReader"/>.</summary>
internal sealed class CapabilitySectionReader(ProfileReadContext context)
{
    private readonly YamlProblems _problems = context.Problems;

    public static NetworkAnalyserCommands? ReadNetworkAnalyser(ProfileSectionReader reader) =>
        reader.Open(NetworkKeys, ForeignKeys.ScpiInRawNetwork) is { } s ? new CapabilitySectionReader(reader.Context).ReadNetworkAnalyser(s) : null;

    public static SpectrumAnalyserCommands? ReadSpectrumAnalyser(ProfileSectionReader reader) =>
        reader.Open(SpectrumKeys, ForeignKeys.ScpiInRawSpectrum) is { } s ? new CapabilitySectionReader(reader.Context).ReadSpectrumAnalyser(s) : null;

    public static SignalGeneratorCommands? ReadSignalGenerator(ProfileSectionReader reader) =>
        reader.Open(GeneratorKeys) is { } s ? new CapabilitySectionReader(reader.Context).ReadSignalGenerator(s) : null;

    private NetworkAnalyserCommands? ReadNetworkAnalyser(StrictMap s)
    {

        var setup = context.Commands(s, Setup, TemplateVariables.NetworkSweep,
            "the setup sets the sweep, e.g. \"setup: band {start:hz} {stop:hz} {points}\"");
        CheckCoversRange(s, setup);
        if (setup is { Count: > 0 } && !setup.Any(c => c.Uses("points")))
        {
            _problems.Add(s.Key(Setup)!, $"the \"{Setup}\" commands never send the number of points; use {{points}}");
        }

        var ifBandwidth = OwnCommand(s, IfBandwidth, TemplateVariables.NetworkIfBandwidth, "ifbw");
        var averages = OwnCommand(s, Averages, TemplateVariables.NetworkAverages, "averages");
        var sweep = context.Commands(s, Sweep, TemplateVariables.NetworkSweep);
        var read = ReadParameterCommands(s);
        var data = new ReplyGrammarReader(context).Read(s, power: false, defaultPoints: null);
        return setup is { Count: > 0 } && sweep is not null && read is not null && data is not null
            ? new NetworkAnalyserCommands(setup, ifBandwidth, averages, sweep, read, data)
            : null;
    }

    private SpectrumAnalyserCommands? ReadSpectrumAnalyser(StrictMap s)
    {

        var setup = context.Commands(s, Setup, TemplateVariables.Spectrum,
            "the setup sets span, RBW, attenuation and reference level, e.g. \"setup: ['span {start:hz} {stop:hz}', 'rbw {rbw:hz}']\"");
        CheckCoversRange(s, setup);
        var sweep = context.Commands(s, Sweep, TemplateVariables.Spectrum);
        var read = context.Command(s, Read, TemplateVariables.Spectrum, "the command that reads the trace, e.g. \"read: trace\"");
        var defaultPoints = s.Integer(DefaultPoints, 2, 1_000_000);
        if (!s.Has(DefaultPoints) && setup is not null && setup.Any(c => c.Uses("points")))
        {
            _problems.Add(s.Key(Setup)!, $"the \"{Setup}\" commands send {{points}}; add \"{DefaultPoints}\" for settings that do not choose a point count");
        }

        var data = new ReplyGrammarReader(context).Read(s, power: true, defaultPoints);
        return setup is { Count: > 0 } && sweep is not null && read is not null && data is not null
            ? new SpectrumAnalyserCommands(setup, sweep, read, data, defaultPoints)
            : null;
    }

    private SignalGeneratorCommands? ReadSignalGenerator(StrictMap s)
    {

        var frequency = RequiredCommand(s, FrequencyKey, TemplateVariables.GeneratorFrequency, "frequency", "freq {frequency:hz}");
        var level = RequiredCommand(s, LevelKey, TemplateVariables.GeneratorLevel, "level", "level {level:dbm}");
        var output = RequiredCommand(s, Output, TemplateVariables.GeneratorOutput, "output", "rf {output}");
        return frequency is not null && level is not null && output is not null
            ? new SignalGeneratorCommands(frequency, level, output)
            : null;
    }

    private void CheckCoversRange(StrictMap section, List<CommandTemplate>? setup)
    {
        if (setup is null)
        {
            return;
        }

        if (setup.Count == 0)
        {
            _problems.Add(section.Key(Setup)!, $"\"{Setup}\" holds no command; expected the commands that set the sweep");
            return;
        }

        bool Uses(string name) => setup.Any(c => c.Uses(name));
        if (!(Uses("start") && Uses("stop")) && !(Uses("centre") && Uses("span")))
        {
            _problems.Add(section.Key(Setup)!, $"the \"{Setup}\" commands never send the frequencies; use {{start}} and {{stop}}, or {{centre}} and {{span}}");
        }
    }

    private CommandTemplate? OwnCommand(StrictMap section, string key, IReadOnlyList<TemplateVariable> variables, string own)
    {
        var command = context.Command(section, key, variables);
        if (command is not null && !command.Uses(own))
        {
            _problems.Add(section.ValueLocation(key), $"\"{key}\" must send the value it sets; use {{{own}}}");
            return null;
        }

        return command;
    }

    private CommandTemplate? RequiredCommand(StrictMap section, string key, IReadOnlyList<TemplateVariable> variables, string own, string example)
    {
        var command = context.Command(section, key, variables, $"the command that sets it, e.g. \"{key}: {example}\"");
        if (command is not null && !command.Uses(own))
        {
            _problems.Add(section.ValueLocation(key), $"\"{key}\" must send the value it sets; use {{{own}}}");
            return null;
        }

        return command;
    }

    private Dictionary<TraceQuantity, CommandTemplate>? ReadParameterCommands(StrictMap section)
    {
        var keys = Parameters.Select(p => p.Word).ToList();
        var read = section.Mapping(Read, keys, "the commands that read each S-parameter, e.g. \"read: {S21: data s21}\"");
        if (read is null)
        {
            return null;
        }

        var commands = new Dictionary<TraceQuantity, CommandTemplate>();
        foreach (var (word, quantity) in Parameters)
        {
            if (context.Command(read, word, TemplateVariables.NetworkSweep) is { } command)
            {
                commands[quantity] = command;
            }
        }

        if (read.Map.Entries.Count == 0)
        {
            _problems.Add(section.ValueLocation(Read), $"\"{Read}\" names no S-parameter; expected one or more of {string.Join(", ", keys)}");
        }

        return commands.Count > 0 ? commands : null;
    }
}
