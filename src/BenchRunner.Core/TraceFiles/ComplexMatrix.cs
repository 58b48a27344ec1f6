using System.Numerics;

namespace BenchRunner.Core.TraceFiles;

/// <summary>A small square complex matrix (network parameters of one frequency point).</summary>
internal sealed class ComplexMatrix
{
    private readonly Complex[] _cells;

    private ComplexMatrix(int size, Complex[] cells)
    {
        Size = size;
        _cells = cells;
    }

    /// <summary>The number of rows (and columns).</summary>
    public int Size { get; }

    /// <summary>The element at 0-based <paramref name="row"/> and <paramref name="col"/>.</summary>
    public Complex this[int row, int col]
    {
        get => _cells[row * Size + col];
        set => _cells[row * Size + col] = value;
    }

    /// <summary>A zero matrix.</summary>
    public static ComplexMatrix Zero(int size)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(size, 1);
        return new ComplexMatrix(size, new Complex[size * size]);
    }

    /// <summary>A matrix from row-major elements.</summary>
    public static ComplexMatrix FromRows(int size, IEnumerable<Complex> rowMajor)
    {
        var cells = rowMajor.ToArray();
        if (cells.Length != size * size)
        {
            throw new ArgumentException($"A {size}x{size} matrix needs {size * size} elements, got {cells.Length}.", nameof(rowMajor));
        }

        return new ComplexMatrix(size, cells);
    }

    /// <summary>A diagonal matrix.</summary>
    public static ComplexMatrix Diagonal(IReadOnlyList<double> diagonal)
    {
        var m = Zero(diagonal.Count);
        for (int i = 0; i < diagonal.Count; i++)
        {
            m[i, i] = diagonal[i];
        }

        return m;
    }

    /// <summary>The identity matrix.</summary>
    public static ComplexMatrix Identity(int size) => Diagonal(Enumerable.Repeat(1.0, size).ToArray());

    /// <summary>The elements row by row.</summary>
    public IEnumerable<Complex> RowMajor() => _cells;

    /// <summary>This matrix with every element multiplied by <paramref name="factor"/>.</summary>
    public ComplexMatrix Times(double factor) => new(Size, _cells.Select(c => c * factor).ToArray());

    public static ComplexMatrix operator +(ComplexMatrix a, ComplexMatrix b) => Combine(a, b, (x, y) => x + y);

    public static ComplexMatrix operator -(ComplexMatrix a, ComplexMatrix b) => Combine(a, b, (x, y) => x - y);

    public static ComplexMatrix operator *(ComplexMatrix a, ComplexMatrix b)
    {
        CheckSameSize(a, b);
        int n = a.Size;
        var result = Zero(n);
        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                Complex sum = Complex.Zero;
                for (int k = 0; k < n; k++)
                {
                    sum += a[i, k] * b[k, j];
                }

                result[i, j] = sum;
            }
        }

        return result;
    }

    /// <summary>
    /// The inverse by Gauss-Jordan elimination with partial pivoting, or null when the matrix is
    /// singular (a pivot smaller than 1e-12 of the largest element).
    /// </summary>
    public ComplexMatrix? Inverse()
    {
        int n = Size;
        var a = (Complex[])_cells.Clone();
        var inv = Identity(n)._cells;
        double scale = a.Max(c => c.Magnitude);
        if (scale == 0)
        {
            return null;
        }

        for (int col = 0; col < n; col++)
        {
            int pivot = col;
            for (int r = col + 1; r < n; r++)
            {
                if (a[r * n + col].Magnitude > a[pivot * n + col].Magnitude)
                {
                    pivot = r;
                }
            }

            if (a[pivot * n + col].Magnitude <= 1e-12 * scale)
            {
                return null;
            }

            if (pivot != col)
            {
                SwapRows(a, n, pivot, col);
                SwapRows(inv, n, pivot, col);
            }

            var p = a[col * n + col];
            for (int k = 0; k < n; k++)
            {
                a[col * n + k] /= p;
                inv[col * n + k] /= p;
            }

            for (int r = 0; r < n; r++)
            {
                if (r == col)
                {
                    continue;
                }

                var factor = a[r * n + col];
                if (factor == Complex.Zero)
                {
                    continue;
                }

                for (int k = 0; k < n; k++)
                {
                    a[r * n + k] -= factor * a[col * n + k];
                    inv[r * n + k] -= factor * inv[col * n + k];
                }
            }
        }

        return new ComplexMatrix(n, inv);
    }

    private static void SwapRows(Complex[] m, int n, int r1, int r2)
    {
        for (int k = 0; k < n; k++)
        {
            (m[r1 * n + k], m[r2 * n + k]) = (m[r2 * n + k], m[r1 * n + k]);
        }
    }

    private static ComplexMatrix Combine(ComplexMatrix a, ComplexMatrix b, Func<Complex, Complex, Complex> op)
    {
        CheckSameSize(a, b);
        var cells = new Complex[a._cells.Length];
        for (int i = 0; i < cells.Length; i++)
        {
            cells[i] = op(a._cells[i], b._cells[i]);
        }

        return new ComplexMatrix(a.Size, cells);
    }

    private static void CheckSameSize(ComplexMatrix a, ComplexMatrix b)
    {
        if (a.Size != b.Size)
        {
            throw new ArgumentException($"Matrix sizes differ: {a.Size} and {b.Size}.");
        }
    }
}
