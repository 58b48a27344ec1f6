using System.Globalization;
using BenchRunner.Core.Diagnostics;
using System.Numerics;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.TraceFiles;

/// <summary>
/// BenchRunner's own CSV layout for trace sets (described in docs/trace-files.md):
/// <code>
/// # benchrunner-trace 1
/// # reference_ohms = 50
/// frequency_hz,s11_re,s11_im,s21_re,s21_im
/// 137500000,0.012,-0.034,0.741,0.002
/// </code>
/// Comma-separated, invariant culture, a point as decimal separator. The first line names the
/// layout and its version; <c>#</c> lines up to the header row carry metadata
/// (<c># key = value</c>) or free comments; the header row names the columns: frequency in hertz
/// first, then per S-parameter its real and imaginary parts, per power trace its level in dBm.
/// A file holding one power trace may be just <c>frequency_hz,power_dbm</c> and its rows.
/// </summary>
public static class CsvTraceFile
{
    /// <summary>The word that opens the first line, after <c>#</c>.</summary>
    public const string Signature = "benchrunner-trace";

    /// <summary>The layout version this code reads and writes.</summary>
    public const int FormatVersion = 1;

    /// <summary>The name of the frequency column (hertz).</summary>
    public const string FrequencyColumn = "frequency_hz";

    /// <summary>The name of a power trace's column (dBm).</summary>
    public const string PowerColumn = "power_dbm";

    /// <summary>The metadata key of the reference impedance (ohms).</summary>
    public const string ReferenceKey = "reference_ohms";

    /// <summary>Reads a CSV trace file; the path as given is the file name in error messages.</summary>
    /// <exception cref="InputFormatException">The file is missing, unreadable or malformed.</exception>
    public static TraceSet Read(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        using var reader = TraceFileAccess.OpenText(path);
        return Parse(reader, path);
    }

    /// <summary>Parses CSV trace text.</summary>
    /// <param name="reader">The text.</param>
    /// <param name="sourceName">The file name to put in error messages.</param>
    /// <exception cref="InputFormatException">The text is malformed.</exception>
    public static TraceSet Parse(TextReader reader, string sourceName)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(sourceName);
        return new CsvTraceParser(sourceName).Parse(reader);
    }

    /// <summary>
    /// Writes a trace set: the signature line, the reference impedance, the header row and one row
    /// per point, numbers with round-trip precision.
    /// </summary>
    public static void Write(TextWriter writer, TraceSet set)
    {
        ArgumentNullException.ThrowIfNull(writer);
        ArgumentNullException.ThrowIfNull(set);
        writer.WriteLine($"# {Signature} {FormatVersion.ToString(CultureInfo.InvariantCulture)}");
        writer.WriteLine($"# {ReferenceKey} = {TraceFileText.Format(set.ReferenceOhms)}");

        var header = new List<string> { FrequencyColumn };
        foreach (var trace in set.Traces)
        {
            header.AddRange(ColumnNames(trace.Quantity));
        }

        writer.WriteLine(string.Join(",", header));
        var fields = new List<string>(header.Count);
        for (int p = 0; p < set.Axis.Count; p++)
        {
            fields.Clear();
            fields.Add(TraceFileText.Format(set.Axis.Hertz[p]));
            foreach (var trace in set.Traces)
            {
                if (trace is ComplexTrace complex)
                {
                    Complex s = complex.Samples[p];
                    fields.Add(TraceFileText.Format(s.Real));
                    fields.Add(TraceFileText.Format(s.Imaginary));
                }
                else
                {
                    fields.Add(TraceFileText.Format(trace.LevelsDb[p]));
                }
            }

            writer.WriteLine(string.Join(",", fields));
        }
    }

    /// <summary>The column names of a quantity: <c>s21_re</c>, <c>s21_im</c>, or <c>power_dbm</c>.</summary>
    internal static string[] ColumnNames(TraceQuantity quantity) =>
        quantity == TraceQuantity.Power
            ? [PowerColumn]
            : [$"{quantity.ToString().ToLowerInvariant()}_re", $"{quantity.ToString().ToLowerInvariant()}_im"];
}
