using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Internal;

/// <summary>Dense coordinate-vector helpers over a field, used by the structure algorithms.</summary>
internal static class Vectors<T>
    where T : IFieldElement<T>
{
    public static T[] Zero(int length)
    {
        var v = new T[length];
        Array.Fill(v, T.Zero);
        return v;
    }

    public static T[] Unit(int length, int index)
    {
        var v = Zero(length);
        v[index] = T.One;
        return v;
    }

    public static bool IsZero(T[] v) => Array.TrueForAll(v, e => e.IsZero);

    public static T[] Add(T[] a, T[] b)
    {
        var r = new T[a.Length];
        for (var i = 0; i < a.Length; i++)
        {
            r[i] = a[i] + b[i];
        }

        return r;
    }

    public static T[] Subtract(T[] a, T[] b)
    {
        var r = new T[a.Length];
        for (var i = 0; i < a.Length; i++)
        {
            r[i] = a[i] - b[i];
        }

        return r;
    }

    public static T[] Scale(T s, T[] a)
    {
        var r = new T[a.Length];
        for (var i = 0; i < a.Length; i++)
        {
            r[i] = s * a[i];
        }

        return r;
    }

    /// <summary>
    /// v times the least common multiple of the denominators of its entries (both parts of a Gaussian rational), so the
    /// entries are integers and products of them skip the rational normalisation; v itself for other scalar types.
    /// Spans the same line as v.
    /// </summary>
    public static T[] ClearDenominators(T[] v)
    {
        var lcm = System.Numerics.BigInteger.One;
        foreach (var e in v)
        {
            switch (e)
            {
                case Rational q:
                    lcm = Lcm(lcm, q.Denominator);
                    break;
                case GaussianRational g:
                    lcm = Lcm(Lcm(lcm, g.Real.Denominator), g.Imaginary.Denominator);
                    break;
                default:
                    return v;
            }
        }

        return lcm.IsOne ? v : Scale(T.FromInteger(lcm), v);
    }

    private static System.Numerics.BigInteger Lcm(System.Numerics.BigInteger a, System.Numerics.BigInteger b) =>
        b.IsOne ? a : a / System.Numerics.BigInteger.GreatestCommonDivisor(a, b) * b;

    /// <summary>In-place a += s b.</summary>
    public static void AddScaled(T[] a, T s, T[] b)
    {
        if (s.IsZero)
        {
            return;
        }

        for (var i = 0; i < a.Length; i++)
        {
            if (!b[i].IsZero)
            {
                a[i] += s * b[i];
            }
        }
    }

    public static bool Equal(T[] a, T[] b)
    {
        for (var i = 0; i < a.Length; i++)
        {
            if (!a[i].Equals(b[i]))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>
    /// Reduced row echelon basis of the span of the vectors (rows): canonical, so two spans are equal exactly when
    /// their echelon bases are equal.
    /// </summary>
    public static T[][] EchelonBasis(IEnumerable<T[]> vectors, int length)
    {
        var rows = vectors.Select(v => (T[])v.Clone()).ToList();
        var basis = new List<T[]>();
        var pivotRow = 0;
        for (var col = 0; col < length && pivotRow < rows.Count; col++)
        {
            var found = -1;
            for (var r = pivotRow; r < rows.Count; r++)
            {
                if (!rows[r][col].IsZero)
                {
                    found = r;
                    break;
                }
            }

            if (found < 0)
            {
                continue;
            }

            (rows[pivotRow], rows[found]) = (rows[found], rows[pivotRow]);
            var pivot = rows[pivotRow];
            var inv = pivot[col].Reciprocal();
            for (var k = 0; k < length; k++)
            {
                pivot[k] *= inv;
            }

            for (var r = 0; r < rows.Count; r++)
            {
                if (r != pivotRow && !rows[r][col].IsZero)
                {
                    AddScaled(rows[r], -rows[r][col], pivot);
                }
            }

            pivotRow++;
        }

        for (var r = 0; r < pivotRow; r++)
        {
            basis.Add(rows[r]);
        }

        return basis.ToArray();
    }

    /// <summary>
    /// A basis of the solutions x of the homogeneous system sum_j x_j columns[j] = 0, where each equation is a row of
    /// <paramref name="equations"/> (equations[r][j] = coefficient of unknown j in equation r).
    /// </summary>
    public static T[][] NullSpace(IReadOnlyList<T[]> equations, int unknowns)
    {
        var reduced = EchelonBasis(equations, unknowns);
        var pivots = new int[reduced.Length];
        for (var r = 0; r < reduced.Length; r++)
        {
            pivots[r] = Array.FindIndex(reduced[r], e => !e.IsZero);
        }

        var isPivot = new bool[unknowns];
        foreach (var p in pivots)
        {
            isPivot[p] = true;
        }

        var result = new List<T[]>();
        for (var free = 0; free < unknowns; free++)
        {
            if (isPivot[free])
            {
                continue;
            }

            var x = Zero(unknowns);
            x[free] = T.One;
            for (var r = 0; r < reduced.Length; r++)
            {
                x[pivots[r]] = -reduced[r][free];
            }

            result.Add(x);
        }

        return result.ToArray();
    }

    /// <summary>
    /// One solution of A x = b with A given by its rows, or null when inconsistent (free unknowns set to zero).
    /// </summary>
    public static T[]? SolveOne(IReadOnlyList<T[]> rows, T[] rhs, int unknowns)
    {
        var augmented = new List<T[]>();
        for (var r = 0; r < rows.Count; r++)
        {
            var row = new T[unknowns + 1];
            Array.Copy(rows[r], row, unknowns);
            row[unknowns] = rhs[r];
            augmented.Add(row);
        }

        var reduced = EchelonBasis(augmented, unknowns + 1);
        var x = Zero(unknowns);
        foreach (var row in reduced)
        {
            var p = Array.FindIndex(row, e => !e.IsZero);
            if (p == unknowns)
            {
                return null;
            }

            x[p] = row[unknowns];
        }

        return x;
    }
}

/// <summary>
/// Coordinates with respect to a fixed list of linearly independent vectors: precomputes an invertible square
/// submatrix, so each query costs one small matrix-vector product plus a membership check.
/// </summary>
internal sealed class CoordinateSolver<T>
    where T : IFieldElement<T>
{
    private readonly T[][] _basis;
    private readonly int[] _rows;
    private readonly T[][] _inverse;

    private CoordinateSolver(T[][] basis, int[] rows, T[][] inverse)
    {
        _basis = basis;
        _rows = rows;
        _inverse = inverse;
    }

    public int Count => _basis.Length;

    /// <summary>Builds the solver, or returns null together with the index of the first vector that depends on earlier ones.</summary>
    public static CoordinateSolver<T> Create(IReadOnlyList<T[]> basis, int length)
    {
        // Independent rows of the length x k matrix whose columns are the basis vectors.
        var k = basis.Count;
        var chosen = new List<int>();
        var echelon = new List<(T[] Row, int Pivot)>();
        for (var r = 0; r < length && chosen.Count < k; r++)
        {
            var row = new T[k];
            for (var j = 0; j < k; j++)
            {
                row[j] = basis[j][r];
            }

            foreach (var (e, p) in echelon)
            {
                if (!row[p].IsZero)
                {
                    Vectors<T>.AddScaled(row, -row[p], e);
                }
            }

            var pivot = Array.FindIndex(row, x => !x.IsZero);
            if (pivot < 0)
            {
                continue;
            }

            var inv = row[pivot].Reciprocal();
            for (var j = 0; j < k; j++)
            {
                row[j] *= inv;
            }

            echelon.Add((row, pivot));
            chosen.Add(r);
        }

        if (chosen.Count < k)
        {
            throw new InvalidOperationException("CoordinateSolver needs linearly independent vectors.");
        }

        var square = new T[k][];
        for (var i = 0; i < k; i++)
        {
            square[i] = new T[k];
            for (var j = 0; j < k; j++)
            {
                square[i][j] = basis[j][chosen[i]];
            }
        }

        return new CoordinateSolver<T>(basis.Select(b => (T[])b.Clone()).ToArray(), chosen.ToArray(), Invert(square, k));
    }

    /// <summary>The coordinates of v in the basis, or null when v is not in the span.</summary>
    public T[]? TryCoordinates(T[] v)
    {
        var k = _basis.Length;
        var c = Vectors<T>.Zero(k);
        for (var i = 0; i < k; i++)
        {
            var s = T.Zero;
            for (var j = 0; j < k; j++)
            {
                var x = v[_rows[j]];
                if (!x.IsZero && !_inverse[i][j].IsZero)
                {
                    s += _inverse[i][j] * x;
                }
            }

            c[i] = s;
        }

        var check = Vectors<T>.Zero(v.Length);
        for (var i = 0; i < k; i++)
        {
            Vectors<T>.AddScaled(check, c[i], _basis[i]);
        }

        return Vectors<T>.Equal(check, v) ? c : null;
    }

    private static T[][] Invert(T[][] a, int n)
    {
        var m = new T[n][];
        for (var i = 0; i < n; i++)
        {
            m[i] = new T[2 * n];
            for (var j = 0; j < n; j++)
            {
                m[i][j] = a[i][j];
                m[i][n + j] = i == j ? T.One : T.Zero;
            }
        }

        var reduced = Vectors<T>.EchelonBasis(m, 2 * n);
        return reduced.Select(r => r[n..]).ToArray();
    }
}
