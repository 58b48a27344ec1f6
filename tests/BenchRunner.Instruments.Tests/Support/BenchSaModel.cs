using System.Globalization;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>
/// The spectrum analyser side of the bench dialect, just enough for tests: a flat floor at
/// -90.00 dBm with one carrier of -30.00 dBm in the bin nearest 137.5 MHz.
/// </summary>
internal sealed class BenchSaModel
{
    public const string Identity = "benchrunner/sim-sa sn SIM-SA-0001 fw 1.0";

    private long _start = 100_000, _stop = 1_500_000_000;
    private int _points = 401;

    public List<string> Settings { get; } = [];

    public IReadOnlyList<string>? Handle(string line)
    {
        var words = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        switch (words)
        {
            case ["who"]:
                return [Identity];
            case ["span", var a, var b]:
                _start = long.Parse(a, CultureInfo.InvariantCulture);
                _stop = long.Parse(b, CultureInfo.InvariantCulture);
                Settings.Add(line);
                return [];
            case ["rbw", _] or ["att", _] or ["ref", _]:
                Settings.Add(line);
                return [];
            case ["pts", var n]:
                _points = int.Parse(n, CultureInfo.InvariantCulture);
                Settings.Add(line);
                return [];
            case ["go"]:
                return [];
            case ["trace"]:
                var carrier = (int)Math.Round((137.5e6 - _start) / (_stop - _start) * (_points - 1));
                return [string.Join(",", Enumerable.Range(0, _points).Select(i => i == carrier ? "-3000" : "-9000"))];
            default:
                return ["err 1 unknown command"];
        }
    }
}
