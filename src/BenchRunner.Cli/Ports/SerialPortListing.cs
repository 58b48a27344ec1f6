using System.IO.Ports;

namespace BenchRunner.Cli.Ports;

/// <summary>The serial ports present on this computer, with stable names where the system offers them.</summary>
public static class SerialPortListing
{
    /// <summary>A port: the device path, and the stable aliases (Linux <c>/dev/serial/by-id</c>) that point at it.</summary>
    public sealed record Port(string Path, IReadOnlyList<string> Aliases);

    /// <summary>Lists the ports, sorted by path.</summary>
    public static IReadOnlyList<Port> List()
    {
        var aliases = StableAliases();
        return SerialPort.GetPortNames()
            .Distinct(StringComparer.Ordinal)
            .Order(StringComparer.Ordinal)
            .Select(path => new Port(path, aliases.TryGetValue(path, out var a) ? a : []))
            .ToList();
    }

    private static Dictionary<string, IReadOnlyList<string>> StableAliases()
    {
        var result = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        foreach (var folder in new[] { "/dev/serial/by-id", "/dev/serial/by-path" })
        {
            if (!Directory.Exists(folder))
            {
                continue;
            }

            foreach (var link in Directory.EnumerateFileSystemEntries(folder))
            {
                var target = new FileInfo(link).ResolveLinkTarget(returnFinalTarget: true)?.FullName;
                if (target is null)
                {
                    continue;
                }

                if (!result.TryGetValue(target, out var list))
                {
                    result[target] = list = [];
                }

                list.Add(link);
            }
        }

        return result.ToDictionary(kv => kv.Key, kv => (IReadOnlyList<string>)kv.Value.Order(StringComparer.Ordinal).ToList(), StringComparer.Ordinal);
    }
}
