using System.Globalization;
using System.Numerics;

namespace BenchRunner.Instruments.Tests.Support;

/// <summary>
/// The network analyser side of the bench dialect (docs/simulator-dialect.md), just enough for
/// tests: the device under test is a series resonator between the ports, centre 137.5 MHz,
/// loaded Q 45, so S21 = 1/(1 + jQ(f/f0 − f0/f)) and S11 = 1 − S21.
/// </summary>
internal sealed class BenchVnaModel
{
    public const double CentreHertz = 137.5e6;
    public const double LoadedQ = 45;
    public const string Identity = "benchrunner/sim-vna sn SIM-VNA-0001 fw 1.0";

    private long _start, _stop;
    private int _points;
    private bool _swept;

    /// <summary>Commands the device leaves unanswered (to provoke timeouts).</summary>
    public HashSet<string> Silent { get; } = [];

    public static Complex S21(double hertz) =>
        1 / new Complex(1, LoadedQ * (hertz / CentreHertz - CentreHertz / hertz));

    public IReadOnlyList<string>? Handle(string line)
    {
        if (Silent.Contains(line))
        {
            return null;
        }

        var words = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        switch (words)
        {
            case ["who"]:
                return [Identity];
            case ["band", var a, var b, var n]:
                if (!long.TryParse(a, out var start) || !long.TryParse(b, out var stop) || !int.TryParse(n, out var points))
                {
                    return ["err 4 not a number"];
                }

                if (start < 100_000 || stop > 1_500_000_000 || stop <= start || points is < 2 or > 1601)
                {
                    return ["err 3 value out of range"];
                }

                (_start, _stop, _points, _swept) = (start, stop, points, false);
                return [];
            case ["band", ..]:
                return ["err 2 wrong number of arguments"];
            case ["ifbw", _] or ["avg", _]:
                return [];
            case ["go"]:
                if (_points == 0)
                {
                    return ["err 5 no sweep"];
                }

                _swept = true;
                return [];
            case ["data", var p] when p is "s11" or "s21":
                return _swept ? Data(p) : ["err 5 no sweep"];
            default:
                return ["err 1 unknown command"];
        }
    }

    /// <summary>The frequency of point <paramref name="i"/> as the device reports it (whole hertz).</summary>
    public long PointHertz(int i) => (long)Math.Round(_start + (double)(_stop - _start) * i / (_points - 1));

    private List<string> Data(string parameter)
    {
        var lines = new List<string> { $"# {parameter} {_points}" };
        for (int i = 0; i < _points; i++)
        {
            var f = PointHertz(i);
            var s21 = S21(f);
            var s = parameter == "s21" ? s21 : 1 - s21;
            lines.Add(string.Create(CultureInfo.InvariantCulture, $"{f} {s.Real:0.000000E+00} {s.Imaginary:0.000000E+00}"));
        }

        return lines;
    }
}
