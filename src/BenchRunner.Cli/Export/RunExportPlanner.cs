using System.Globalization;
using System.Text;
using BenchRunner.Core.Traces;
using BenchRunner.Storage;

namespace BenchRunner.Cli.Export;

/// <summary>
/// Decides which files an export writes: the sweeps of one step that follow each other on the
/// same frequency points go into one file, unless a quantity repeats (a repeated measurement starts
/// a new file). Touchstone holds S11 alone (.s1p) or all four two-port parameters (.s2p); any
/// other S-parameter combination would need made-up values, so those traces go to CSV instead.
/// </summary>
public static class RunExportPlanner
{
    private static readonly TraceQuantity[] TwoPort = [TraceQuantity.S11, TraceQuantity.S21, TraceQuantity.S12, TraceQuantity.S22];

    /// <summary>Plans the files for run <paramref name="runId"/>'s <paramref name="sweeps"/> (in sequence order).</summary>
    public static IReadOnlyList<ExportFile> Plan(long runId, IReadOnlyList<StoredSweep> sweeps, ExportFormat format)
    {
        ArgumentNullException.ThrowIfNull(sweeps);
        var files = new List<ExportFile>();
        foreach (var group in Group(sweeps))
        {
            if (format == ExportFormat.Csv || group[0].Record.Trace is PowerTrace)
            {
                files.Add(File(runId, group, isTouchstone: false, note: null));
                continue;
            }

            var quantities = group.Select(s => s.Record.Trace.Quantity).ToHashSet();
            if (quantities.SetEquals([TraceQuantity.S11]) || quantities.SetEquals(TwoPort))
            {
                files.Add(File(runId, group, isTouchstone: true, note: null));
                continue;
            }

            var s11 = group.Where(s => s.Record.Trace.Quantity == TraceQuantity.S11).ToList();
            var rest = group.Except(s11).ToList();
            if (s11.Count > 0)
            {
                files.Add(File(runId, s11, isTouchstone: true, note: null));
            }

            var names = string.Join(", ", rest.Select(s => s.Record.Trace.Quantity));
            files.Add(File(runId, rest, isTouchstone: false,
                note: $"{names} without all four two-port parameters: a Touchstone file cannot hold that, so CSV"));
        }

        return files;
    }

    /// <summary>Keeps only letters, digits, '.', '_' and '-'; anything else becomes '-'.</summary>
    public static string SafeName(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var safe = new StringBuilder(text.Length);
        foreach (char c in text.Trim())
        {
            safe.Append(char.IsAsciiLetterOrDigit(c) || c is '.' or '_' or '-' ? c : '-');
        }

        var name = safe.ToString().Trim('.', '-');
        return name.Length == 0 ? "unnamed" : name;
    }

    private static List<List<StoredSweep>> Group(IReadOnlyList<StoredSweep> sweeps)
    {
        var groups = new List<List<StoredSweep>>();
        List<StoredSweep>? current = null;
        foreach (var sweep in sweeps)
        {
            var trace = sweep.Record.Trace;
            bool joins = current is not null
                && trace is ComplexTrace
                && current[0].Record.Trace is ComplexTrace
                && current[0].Record.StepName == sweep.Record.StepName
                && current[0].Record.Trace.Axis.SamePointsAs(trace.Axis)
                && current.All(s => s.Record.Trace.Quantity != trace.Quantity);
            if (joins)
            {
                current!.Add(sweep);
            }
            else
            {
                current = [sweep];
                groups.Add(current);
            }
        }

        return groups;
    }

    private static ExportFile File(long runId, List<StoredSweep> sweeps, bool isTouchstone, string? note)
    {
        var first = sweeps[0];
        var set = new TraceSet(first.Record.Trace.Axis, sweeps.Select(s => s.Record.Trace));
        var traces = string.Join("-", sweeps.Select(s => SafeName(s.Record.TraceName ?? s.Record.Trace.Quantity.ToString())));
        var extension = !isTouchstone ? ".csv" : set.Traces.Count == 1 ? ".s1p" : ".s2p";
        // The sequence number keeps names unique when a step is measured more than once.
        var name = string.Create(CultureInfo.InvariantCulture,
            $"run{runId}-{first.Sequence:000}-{SafeName(first.Record.StepName)}-{traces}{extension}");
        return new ExportFile(name, set, isTouchstone, sweeps.Select(s => s.Sequence).ToList(), note);
    }
}
