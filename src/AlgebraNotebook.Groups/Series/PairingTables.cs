using System.Runtime.CompilerServices;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The table operations of <see cref="BchDualBasisSolver"/> in the arithmetic <typeparamref name="T"/>, shared by the
/// pass over words (<see cref="DualBasisPass{T}"/>) and the bound over classes (<see cref="DualBasisBound"/>). A table
/// t(i, k) = &lt;S_w, X^i Z^k&gt; / (i! k!) of a word of length m with x letters X is triangular: row i (0..x) holds
/// k = 1..m - i. A product is held as a rectangle (rows a, columns j = 0..length) in a <see cref="Scratch"/>.
/// </summary>
internal sealed class PairingTables<T>
    where T : struct, IPassArithmetic<T>
{
    private readonly T[] _alpha;
    private readonly T[] _bernoulli;
    private readonly T[] _inverse;
    private readonly T[] _inverseFactorial;
    private readonly T[][] _rowZero;

    /// <summary>The constants of the plan in this arithmetic.</summary>
    public PairingTables(BchDualBasisPlan plan)
    {
        Degree = plan.Degree;
        _alpha = plan.Alpha.Select(T.FromRational).ToArray();
        _bernoulli = plan.Bernoulli.Select(T.FromRational).ToArray();
        _inverse = plan.Inverses.Select(T.FromRational).ToArray();
        _inverseFactorial = plan.InverseFactorials.Select(T.FromRational).ToArray();
        _rowZero = plan.RowZero.Select(row => row.Select(T.FromRational).ToArray()).ToArray();
        One = T.FromRational(1);
    }

    /// <summary>N.</summary>
    public int Degree { get; }

    /// <summary>The image of 1.</summary>
    public T One { get; }

    /// <summary>Entries of the table of a word of length m with x letters X.</summary>
    public static int TableSize(int m, int x) => RowOffset(m, x + 1);

    /// <summary>Fresh scratch for one thread.</summary>
    public Scratch NewScratch() => new(Degree);

    /// <summary>The product := the table (length m, x rows).</summary>
    public static void Load(ReadOnlySpan<T> table, int m, int x, Scratch s)
    {
        var stride = s.Stride;
        var product = s.Product;
        for (var i = 0; i <= x; i++)
        {
            product[i * stride] = T.Zero;
            table.Slice(RowOffset(m, i), m - i).CopyTo(product.AsSpan((i * stride) + 1));
            product.AsSpan((i * stride) + m - i + 1, i).Clear();
        }
    }

    /// <summary>The product (rows 0..rows, columns 0..columns) := itself times the table (length m, x rows).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void Multiply(int rows, int columns, ReadOnlySpan<T> table, int m, int x, Scratch s)
    {
        var stride = s.Stride;
        var source = s.Product;
        var target = s.Spare;
        for (var a = 0; a <= rows + x; a++)
        {
            target.AsSpan(a * stride, columns + m + 1).Clear();
        }

        for (var a = 0; a <= rows; a++)
        {
            for (var j = 1; j <= columns - a; j++)
            {
                var left = source[(a * stride) + j];
                if (left.IsZero)
                {
                    continue;
                }

                for (var i = 0; i <= x; i++)
                {
                    var right = table.Slice(RowOffset(m, i), m - i);
                    var into = target.AsSpan(((a + i) * stride) + j + 1, m - i);
                    for (var k = 0; k < right.Length; k++)
                    {
                        into[k] = T.MultiplyAdd(into[k], left, right[k]);
                    }
                }
            }
        }

        (s.Product, s.Spare) = (s.Spare, s.Product);
    }

    /// <summary>The product (rows 0..rows, columns 0..columns) := itself / e!.</summary>
    public void DivideByFactorial(int rows, int columns, int e, Scratch s)
    {
        var scale = _inverseFactorial[e];
        for (var a = 0; a <= rows; a++)
        {
            var row = s.Product.AsSpan(a * s.Stride, columns + 1);
            for (var j = 0; j < row.Length; j++)
            {
                row[j] = T.Multiply(row[j], scale);
            }
        }
    }

    /// <summary>
    /// From t_l' in the product (l' of length m - 1 with x - 1 letters X) for l = X l': returns c_l = t_l(0, 1), and
    /// writes t_l into <see cref="Scratch.Table"/> when <paramref name="wantTable"/>.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public T Derive(int m, int x, Scratch s, bool wantTable)
    {
        var stride = s.Stride;
        var product = s.Product;
        var u = s.Pairing;
        var c = T.Zero;
        for (var j = 1; j < m; j++)
        {
            var sum = T.Zero;
            for (var a = 0; a < x && a <= m - 1 - j; a++)
            {
                sum = T.MultiplyAdd(sum, _alpha[a], product[(a * stride) + j]);
            }

            u[j] = sum;
            c = T.MultiplyAdd(c, _bernoulli[j], sum);
        }

        if (!wantTable)
        {
            return c;
        }

        var table = s.Table;
        for (var k = 1; k <= m; k++)
        {
            var weights = _rowZero[k];
            var sum = T.Zero;
            for (var j = Math.Max(1, k - 1); j < m; j++)
            {
                sum = T.MultiplyAdd(sum, weights[j], u[j]);
            }

            table[k - 1] = sum;
        }

        for (var i = 1; i <= x; i++)
        {
            var scale = _inverse[i];
            var offset = RowOffset(m, i);
            var from = (i - 1) * stride;
            for (var k = 1; k <= m - i; k++)
            {
                table[offset + k - 1] = T.Multiply(product[from + k], scale);
            }
        }

        return c;
    }

    // Start of row i in the triangular table of a word of length m: rows of m, m - 1, ... entries.
    private static int RowOffset(int m, int i) => (i * m) - (i * (i - 1) / 2);

    /// <summary>Per-thread work space: two product rectangles, one table and the pairings u(j).</summary>
    public sealed class Scratch(int n)
    {
        /// <summary>Row stride of the rectangles.</summary>
        public int Stride { get; } = n + 1;

        /// <summary>The current product.</summary>
        public T[] Product { get; set; } = new T[(n + 1) * (n + 1)];

        /// <summary>The other rectangle.</summary>
        public T[] Spare { get; set; } = new T[(n + 1) * (n + 1)];

        /// <summary>The derived table.</summary>
        public T[] Table { get; } = new T[(n + 1) * (n + 1)];

        /// <summary>u(j) of the last derivation.</summary>
        public T[] Pairing { get; } = new T[n + 1];
    }
}
