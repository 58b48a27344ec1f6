using System.Globalization;
using System.Text;
using BenchRunner.Core.Traces;

namespace BenchRunner.Core.TraceFiles;

/// <summary>
/// Writes S-parameters as a Touchstone file (version 1, or version 2.0 with keywords).
/// Numbers are written with round-trip precision, so reading the file back gives the same
/// values (exactly for RI, to about 1e-15 relative for MA and DB).
/// </summary>
public static class TouchstoneWriter
{
    private const int PairsPerLine = 4; // The specification's limit for one data line.

    /// <summary>Writes a trace set holding S11 (1 port) or S11, S21, S12 and S22 (2 ports).</summary>
    /// <exception cref="ArgumentException">The set cannot be written as Touchstone, or the options are invalid.</exception>
    public static void Write(TextWriter writer, TraceSet set, TouchstoneWriteOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(set);
        Write(writer, TouchstoneData.FromTraceSet(set), options);
    }

    /// <summary>
    /// Writes network data. Version 2 files use <c>[Two-Port Data Order] 12_21</c> (matrix row
    /// order) and a <c>[Reference]</c> line when the ports' references differ; version 1 files use
    /// the order N11 N21 N12 N22 and need one reference for all ports.
    /// </summary>
    /// <exception cref="ArgumentException">
    /// Invalid options; ports with different references in a version 1 file; or data that cannot be
    /// renormalised to <see cref="TouchstoneWriteOptions.ReferenceOhms"/>.
    /// </exception>
    public static void Write(TextWriter writer, TouchstoneData data, TouchstoneWriteOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(writer);
        ArgumentNullException.ThrowIfNull(data);
        options ??= new TouchstoneWriteOptions();
        options.Validate();

        int n = data.PortCount;
        var references = options.ReferenceOhms is { } r ? Enumerable.Repeat(r, n).ToArray() : data.ReferenceOhms.ToArray();
        bool uniform = references.All(x => x == references[0]);
        if (options.Version == 1 && !uniform)
        {
            throw new ArgumentException(
                "A version 1 Touchstone file has one reference resistance; these ports differ. Write version 2 or set ReferenceOhms.",
                nameof(data));
        }

        var points = Points(data, references);
        int powerOfTen = TouchstoneWords.PowerOfTen(options.FrequencyUnit);

        foreach (var comment in options.Comments)
        {
            writer.WriteLine($"! {comment}");
        }

        if (options.Version == 2)
        {
            writer.WriteLine("[Version] 2.0");
        }

        writer.WriteLine($"# {TouchstoneWords.Word(options.FrequencyUnit)} S {TouchstoneWords.Word(options.Format)} R {TraceFileText.Format(references[0])}");
        if (options.Version == 2)
        {
            writer.WriteLine($"[Number of Ports] {n.ToString(CultureInfo.InvariantCulture)}");
            if (n == 2)
            {
                writer.WriteLine("[Two-Port Data Order] 12_21");
            }

            writer.WriteLine($"[Number of Frequencies] {data.Axis.Count.ToString(CultureInfo.InvariantCulture)}");
            if (!uniform)
            {
                writer.WriteLine("[Reference] " + string.Join(" ", references.Select(TraceFileText.Format)));
            }
        }

        writer.WriteLine(ColumnComment(n, options));
        if (options.Version == 2)
        {
            writer.WriteLine("[Network Data]");
        }

        bool columnsFirst = options.Version == 1 && n == 2;
        for (int p = 0; p < data.Axis.Count; p++)
        {
            var line = new StringBuilder(TraceFileText.FormatScaled(data.Axis.Hertz[p], powerOfTen));
            for (int row = 0; row < n; row++)
            {
                for (int col = 0; col < n; col++)
                {
                    int index = row * n + col;
                    if (index > 0 && n > 2 && (col == 0 || col % PairsPerLine == 0))
                    {
                        // Three or more ports: each matrix row on its own line(s), at most four pairs a line.
                        writer.WriteLine(line.ToString());
                        line.Clear().Append(' ');
                    }

                    var value = columnsFirst ? points[p][col, row] : points[p][row, col];
                    var (first, second) = TouchstoneWords.Encode(options.Format, value);
                    line.Append(' ').Append(TraceFileText.Format(first)).Append(' ').Append(TraceFileText.Format(second));
                }
            }

            writer.WriteLine(line.ToString());
        }

        if (options.Version == 2)
        {
            writer.WriteLine("[End]");
        }
    }

    private static List<ComplexMatrix> Points(TouchstoneData data, double[] references)
    {
        int n = data.PortCount;
        bool renormalise = !references.SequenceEqual(data.ReferenceOhms);
        var points = new List<ComplexMatrix>(data.Axis.Count);
        for (int p = 0; p < data.Axis.Count; p++)
        {
            var m = ComplexMatrix.Zero(n);
            for (int row = 0; row < n; row++)
            {
                for (int col = 0; col < n; col++)
                {
                    m[row, col] = data.Get(p, row, col);
                }
            }

            if (renormalise)
            {
                m = NetworkConversions.Renormalize(m, data.ReferenceOhms, references)
                    ?? throw new ArgumentException(
                        $"The S-parameters at {data.Axis[p]} cannot be renormalised to {string.Join(", ", references.Select(TraceFileText.Format))} ohms.",
                        nameof(data));
            }

            points.Add(m);
        }

        return points;
    }

    private static string ColumnComment(int ports, TouchstoneWriteOptions options)
    {
        var (a, b) = options.Format switch
        {
            TouchstoneFormat.RealImaginary => ("re", "im"),
            TouchstoneFormat.MagnitudeAngle => ("mag", "deg"),
            _ => ("dB", "deg"),
        };
        var names = new List<string>();
        bool columnsFirst = options.Version == 1 && ports == 2;
        for (int i = 1; i <= Math.Min(ports, 2); i++)
        {
            for (int j = 1; j <= Math.Min(ports, 2); j++)
            {
                var (row, col) = columnsFirst ? (j, i) : (i, j);
                names.Add($"S{row}{col}:{a},{b}");
            }
        }

        var suffix = ports > 2 ? " ..." : "";
        return $"! f/{TouchstoneWords.Word(options.FrequencyUnit)} {string.Join(" ", names)}{suffix}";
    }
}
