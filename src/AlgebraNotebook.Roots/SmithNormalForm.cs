using System.Numerics;

namespace AlgebraNotebook.Roots;

/// <summary>
/// Smith normal form of a square integer matrix by unimodular row and column operations: U M V = diag(d_1, ..., d_n)
/// with d_1 | d_2 | ... | d_n. Only U and the diagonal are kept (V is not needed for quotient groups).
/// </summary>
internal static class SmithNormalForm
{
    /// <summary>The invariant factors (non-negative, dividing each other in order) and the row transformation U.</summary>
    public static (BigInteger[] Diagonal, BigInteger[,] RowTransform) Compute(int[,] matrix)
    {
        var n = matrix.GetLength(0);
        var m = new BigInteger[n, n];
        var u = new BigInteger[n, n];
        for (var i = 0; i < n; i++)
        {
            u[i, i] = 1;
            for (var j = 0; j < n; j++)
            {
                m[i, j] = matrix[i, j];
            }
        }

        for (var t = 0; t < n; t++)
        {
            // Choose the smallest non-zero entry of the remaining block as pivot.
            while (true)
            {
                var (pr, pc) = SmallestNonZero(m, t, n);
                if (pr < 0)
                {
                    return (Diagonal(m, n), u);
                }

                SwapRows(m, u, t, pr, n);
                SwapColumns(m, t, pc, n);
                var clean = true;
                for (var i = t + 1; i < n; i++)
                {
                    var q = BigInteger.Divide(m[i, t], m[t, t]);
                    if (!q.IsZero)
                    {
                        AddRow(m, u, i, t, -q, n);
                    }

                    clean &= m[i, t].IsZero;
                }

                for (var j = t + 1; j < n; j++)
                {
                    var q = BigInteger.Divide(m[t, j], m[t, t]);
                    if (!q.IsZero)
                    {
                        for (var i = 0; i < n; i++)
                        {
                            m[i, j] -= q * m[i, t];
                        }
                    }

                    clean &= m[t, j].IsZero;
                }

                if (!clean)
                {
                    continue;
                }

                // Enforce divisibility: if some entry of the block is not divisible by the pivot, fold its row in.
                var bad = -1;
                for (var i = t + 1; i < n && bad < 0; i++)
                {
                    for (var j = t + 1; j < n; j++)
                    {
                        if (!BigInteger.Remainder(m[i, j], m[t, t]).IsZero)
                        {
                            bad = i;
                            break;
                        }
                    }
                }

                if (bad < 0)
                {
                    break;
                }

                AddRow(m, u, t, bad, BigInteger.One, n);
            }

            if (m[t, t].Sign < 0)
            {
                for (var j = 0; j < n; j++)
                {
                    m[t, j] = -m[t, j];
                    u[t, j] = -u[t, j];
                }
            }
        }

        return (Diagonal(m, n), u);
    }

    private static BigInteger[] Diagonal(BigInteger[,] m, int n)
    {
        var d = new BigInteger[n];
        for (var i = 0; i < n; i++)
        {
            d[i] = BigInteger.Abs(m[i, i]);
        }

        return d;
    }

    private static (int, int) SmallestNonZero(BigInteger[,] m, int t, int n)
    {
        var best = (-1, -1);
        var bestValue = BigInteger.Zero;
        for (var i = t; i < n; i++)
        {
            for (var j = t; j < n; j++)
            {
                if (!m[i, j].IsZero && (best.Item1 < 0 || BigInteger.Abs(m[i, j]) < bestValue))
                {
                    best = (i, j);
                    bestValue = BigInteger.Abs(m[i, j]);
                }
            }
        }

        return best;
    }

    private static void SwapRows(BigInteger[,] m, BigInteger[,] u, int a, int b, int n)
    {
        if (a == b)
        {
            return;
        }

        for (var j = 0; j < n; j++)
        {
            (m[a, j], m[b, j]) = (m[b, j], m[a, j]);
            (u[a, j], u[b, j]) = (u[b, j], u[a, j]);
        }
    }

    private static void SwapColumns(BigInteger[,] m, int a, int b, int n)
    {
        if (a == b)
        {
            return;
        }

        for (var i = 0; i < n; i++)
        {
            (m[i, a], m[i, b]) = (m[i, b], m[i, a]);
        }
    }

    private static void AddRow(BigInteger[,] m, BigInteger[,] u, int target, int source, BigInteger factor, int n)
    {
        for (var j = 0; j < n; j++)
        {
            m[target, j] += factor * m[source, j];
            u[target, j] += factor * u[source, j];
        }
    }
}
