using System.Globalization;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>The signal generator side of the bench dialect, just enough for tests; it keeps what it was set to.</summary>
internal sealed class BenchGenModel
{
    public const string Identity = "benchrunner/sim-gen sn SIM-GEN-0001 fw 1.0";

    public double? FrequencyMegahertz { get; private set; }

    public double? LevelDbm { get; private set; }

    public bool? Output { get; private set; }

    /// <summary>Levels above this are refused with "err 3" (the dialect's range is -80 to 0 dBm).</summary>
    public double HighestLevelDbm { get; set; }

    public IReadOnlyList<string>? Handle(string line)
    {
        var words = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        switch (words)
        {
            case ["who"]:
                return [Identity];
            case ["tone", var f]:
                FrequencyMegahertz = double.Parse(f, CultureInfo.InvariantCulture);
                return ["ok"];
            case ["lvl", var l]:
                var level = double.Parse(l, CultureInfo.InvariantCulture);
                if (level > HighestLevelDbm || level < -80)
                {
                    return ["err 3 value out of range"];
                }

                LevelDbm = level;
                return ["ok"];
            case ["rf", "on"]:
                Output = true;
                return ["ok"];
            case ["rf", "off"]:
                Output = false;
                return ["ok"];
            default:
                return ["err 1 unknown command"];
        }
    }
}
