using System.Runtime.CompilerServices;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The table operations of <see cref="BchDualBasisSolver"/> in the arithmetic <typeparamref name="T"/>, shared by the
/// pass over words (<see cref="DualBasisPass{T}"/>) and the bound over classes (<see cref="DualBasisBound"/>). A table
/// t(i, k) = &lt;S_w, X^i Z^k&gt; / k! of a word of length m with x letters X has rows i = 0..x holding k = 1..m - i
/// (<see cref="PairingTable{T}"/>). With this normalisation a shuffle product is a polynomial product in k and a
/// binomial one in i, and the table of X l' is that of l' with one new first row. A product is held as a rectangle
/// (rows a, columns j = 0..length) in a <see cref="Scratch"/>.
/// </summary>
internal sealed class PairingTables<T>
    where T : struct, IPassArithmetic<T>
{
    private readonly T[] _alpha;
    private readonly T[] _bernoulli;
    private readonly T[] _inverseFactorial;
    private readonly T[][] _binomial;
    private readonly T[][] _rowZero;

    /// <summary>The constants of the plan in this arithmetic.</summary>
    public PairingTables(BchDualBasisPlan plan)
    {
        Degree = plan.Degree;
        _alpha = plan.Alpha.Select(T.FromRational).ToArray();
        _bernoulli = plan.Bernoulli.Select(T.FromRational).ToArray();
        _binomial = plan.Binomials.Select(row => row.Select(T.FromRational).ToArray()).ToArray();
        _inverseFactorial = plan.InverseFactorials.Select(T.FromRational).ToArray();
        _rowZero = plan.RowZero.Select(row => row.Select(T.FromRational).ToArray()).ToArray();
        One = T.FromRational(1);
    }

    /// <summary>N.</summary>
    public int Degree { get; }

    /// <summary>The image of 1.</summary>
    public T One { get; }

    /// <summary>Fresh scratch for one thread.</summary>
    public Scratch NewScratch() => new(Degree);

    /// <summary>The product := the table (length m, x rows).</summary>
    public static void Load(PairingTable<T> table, int m, int x, Scratch s)
    {
        var stride = s.Stride;
        var product = s.Product;
        for (var i = 0; i <= x; i++)
        {
            product[i * stride] = T.Zero;
            table.Row(i, m).CopyTo(product.AsSpan((i * stride) + 1));
            product.AsSpan((i * stride) + m - i + 1, i).Clear();
        }
    }

    /// <summary>
    /// The product (rows 0..rows, columns 0..columns) := its shuffle with the table (length m, x rows): entry (a + i,
    /// j + k) gains C(a + i, i) product(a, j) table(i, k).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Multiply(int rows, int columns, PairingTable<T> table, int m, int x, Scratch s)
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
            var binomials = _binomial[a];
            for (var j = 1; j <= columns - a; j++)
            {
                var left = source[(a * stride) + j];
                if (left.IsZero)
                {
                    continue;
                }

                for (var i = 0; i <= x; i++)
                {
                    var weight = i == 0 ? left : T.Multiply(left, binomials[i]);
                    var right = table.Row(i, m);
                    var into = target.AsSpan(((a + i) * stride) + j + 1, right.Length);
                    for (var k = 0; k < right.Length; k++)
                    {
                        into[k] = T.MultiplyAdd(into[k], weight, right[k]);
                    }
                }
            }
        }

        (s.Product, s.Spare) = (s.Spare, s.Product);
    }

    /// <summary>
    /// The product := its shuffle with table^power / power! (the table of a word of length m with x letters X repeated
    /// power times in a Lyndon factorisation); the first factor of a product is loaded, not multiplied. Rows and columns
    /// track the product's extent (both 0 before the first factor).
    /// </summary>
    public void Shuffle(ref int rows, ref int columns, PairingTable<T> table, int m, int x, int power, Scratch s)
    {
        for (var e = 0; e < power; e++)
        {
            if (columns == 0)
            {
                Load(table, m, x, s);
            }
            else
            {
                Multiply(rows, columns, table, m, x, s);
            }

            rows += x;
            columns += m;
        }

        if (power > 1)
        {
            DivideByFactorial(rows, columns, power, s);
        }
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
    /// For l = X l' (length m, x letters X) with t_l' in the product: returns c_l = t_l(0, 1) and, when
    /// <paramref name="firstRow"/> is not empty, writes t_l(0, k) for k = 1..m into it. Rows i &gt;= 1 of t_l are rows
    /// i - 1 of t_l'.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public T DeriveFromProduct(int m, int x, Scratch s, Span<T> firstRow)
    {
        var stride = s.Stride;
        var product = s.Product;
        var u = s.Pairing;
        var column = s.Column;
        for (var j = 1; j < m; j++)
        {
            var count = Math.Min(x, m - j);
            for (var a = 0; a < count; a++)
            {
                column[a] = product[(a * stride) + j];
            }

            u[j] = T.DotProduct(_alpha.AsSpan(0, count), column.AsSpan(0, count));
        }

        return Finish(m, u, firstRow);
    }

    /// <summary>As <see cref="DeriveFromProduct"/>, with t_l' given as a table.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public T DeriveFromTable(int m, int x, PairingTable<T> source, Scratch s, Span<T> firstRow)
    {
        var u = s.Pairing;
        var column = s.Column;
        var data = source.Data;
        var starts = s.RowStarts;
        for (var a = 0; a < x; a++)
        {
            starts[a] = source.RowStart(a);
        }

        for (var j = 1; j < m; j++)
        {
            // Row a of t_l' (length m - 1) holds k = 1..m - 1 - a.
            var count = Math.Min(x, m - j);
            for (var a = 0; a < count; a++)
            {
                column[a] = data[starts[a] + j - 1];
            }

            u[j] = T.DotProduct(_alpha.AsSpan(0, count), column.AsSpan(0, count));
        }

        return Finish(m, u, firstRow);
    }

    // c_l = sum of B+_j u(j); t_l(0, k) = sum over j of RowZero[k][j] u(j) (j from max(1, k - 1); the weights with
    // B+_(j-k+1) vanish for odd j - k + 1 above 1, and cost little in a dot product).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private T Finish(int m, T[] u, Span<T> firstRow)
    {
        var c = T.DotProduct(_bernoulli.AsSpan(1, m - 1), u.AsSpan(1, m - 1));
        for (var k = 1; k <= firstRow.Length; k++)
        {
            var low = Math.Max(1, k - 1);
            firstRow[k - 1] = T.DotProduct(_rowZero[k].AsSpan(low, m - low), u.AsSpan(low, m - low));
        }

        return c;
    }

    /// <summary>Per-thread work space: two product rectangles, the pairings u(j), and row buffers for chains.</summary>
    public sealed class Scratch(int n)
    {
        /// <summary>Row stride of the rectangles.</summary>
        public int Stride { get; } = n + 1;

        /// <summary>The current product.</summary>
        public T[] Product { get; set; } = new T[(n + 1) * (n + 1)];

        /// <summary>The other rectangle.</summary>
        public T[] Spare { get; set; } = new T[(n + 1) * (n + 1)];

        /// <summary>u(j) of the last derivation.</summary>
        public T[] Pairing { get; } = new T[n + 1];

        /// <summary>One column of a table, gathered for a dot product.</summary>
        public T[] Column { get; } = new T[n + 1];

        /// <summary>Start of each row of a table in its array.</summary>
        public int[] RowStarts { get; } = new int[n + 2];

        /// <summary>A chain's rows when none of them is kept (room for a root of length up to N and N first rows).</summary>
        public T[] ChainData { get; } = new T[2 * (n + 1) * (n + 2)];

        /// <summary>Offsets of the root rows in <see cref="ChainData"/>.</summary>
        public int[] ChainRootOffsets { get; } = new int[n + 2];

        /// <summary>Offsets of the members' first rows in <see cref="ChainData"/>.</summary>
        public int[] ChainFirstOffsets { get; } = new int[n + 2];
    }
}
