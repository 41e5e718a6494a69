using System.Reflection;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

public static partial class LinearAlgebra
{
    /// <summary>The largest size accepted by <see cref="DeterminantLaplace{T}"/> (its cost grows like n!).</summary>
    public const int LaplaceMaximumSize = 9;

    /// <summary>
    /// The determinant, choosing a variant: cofactor expansion up to 3x3; fraction-free Bareiss elimination when
    /// <typeparamref name="T"/> has exact division (<see cref="IExactDivision{T}"/>: rationals, Gaussian rationals);
    /// otherwise the division-free Berkowitz algorithm. The 0x0 determinant is 1.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public static T Determinant<T>(Matrix<T> matrix)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("take the determinant of");
        if (matrix.RowCount <= 3)
        {
            return LaplaceCore(matrix);
        }

        return DeterminantChoice<T>.Bareiss is { } bareiss ? bareiss(matrix) : BerkowitzCore(matrix)[^1] * SignOfSize<T>(matrix.RowCount);
    }

    /// <summary>
    /// The determinant by Gaussian elimination over a field (row swaps flip the sign). Cost O(n^3) field operations;
    /// over the rationals intermediate fractions can grow, which <see cref="DeterminantBareiss{T}"/> avoids.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public static T DeterminantByElimination<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("take the determinant of");
        var n = matrix.RowCount;
        var rows = matrix.ToRowArrays();
        var determinant = T.One;
        for (var k = 0; k < n; k++)
        {
            var found = -1;
            for (var i = k; i < n; i++)
            {
                if (!rows[i][k].IsZero)
                {
                    found = i;
                    break;
                }
            }

            if (found < 0)
            {
                return T.Zero;
            }

            if (found != k)
            {
                (rows[k], rows[found]) = (rows[found], rows[k]);
                determinant = -determinant;
            }

            var pivot = rows[k][k];
            determinant *= pivot;
            var inverse = pivot.Reciprocal();
            for (var i = k + 1; i < n; i++)
            {
                if (rows[i][k].IsZero)
                {
                    continue;
                }

                var factor = rows[i][k] * inverse;
                for (var j = k + 1; j < n; j++)
                {
                    rows[i][j] -= factor * rows[k][j];
                }
            }
        }

        return determinant;
    }

    /// <summary>
    /// The determinant by fraction-free (Bareiss) elimination: every division is exact, so over an integral domain
    /// intermediate entries stay minors of the matrix (integers stay integers, with sizes bounded by Hadamard's
    /// inequality). Cost O(n^3) ring operations and exact divisions.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square, or an exact division failed (the scalars are not an integral domain).</exception>
    public static T DeterminantBareiss<T>(Matrix<T> matrix)
        where T : IExactDivision<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("take the determinant of");
        var n = matrix.RowCount;
        if (n == 0)
        {
            return T.One;
        }

        var rows = matrix.ToRowArrays();
        var sign = T.One;
        var previous = T.One;
        for (var k = 0; k < n - 1; k++)
        {
            if (rows[k][k].IsZero)
            {
                var found = -1;
                for (var i = k + 1; i < n; i++)
                {
                    if (!rows[i][k].IsZero)
                    {
                        found = i;
                        break;
                    }
                }

                if (found < 0)
                {
                    return T.Zero;
                }

                (rows[k], rows[found]) = (rows[found], rows[k]);
                sign = -sign;
            }

            var pivot = rows[k][k];
            for (var i = k + 1; i < n; i++)
            {
                for (var j = k + 1; j < n; j++)
                {
                    var numerator = rows[i][j] * pivot - rows[i][k] * rows[k][j];
                    if (!T.TryDivideExact(numerator, previous, out var quotient))
                    {
                        throw new ExactArgumentException(
                            $"Fraction-free elimination of the {matrix.Shape} matrix failed: {numerator} is not divisible by {previous}; the scalars do not form an integral domain.",
                            nameof(matrix));
                    }

                    rows[i][j] = quotient;
                }

                rows[i][k] = T.Zero;
            }

            previous = pivot;
        }

        return sign * rows[n - 1][n - 1];
    }

    /// <summary>
    /// The determinant by the Berkowitz algorithm: no divisions at all, so it works over any commutative ring
    /// (polynomials, truncated series, quotient rings). Cost O(n^4) ring operations. It is (-1)^n times the constant
    /// coefficient of <see cref="CharacteristicPolynomialBerkowitz{T}"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public static T DeterminantBerkowitz<T>(Matrix<T> matrix)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("take the determinant of");
        return BerkowitzCore(matrix)[^1] * SignOfSize<T>(matrix.RowCount);
    }

    /// <summary>
    /// The determinant by cofactor (Laplace) expansion along the first row, skipping zero entries: the plain
    /// definition, kept as the reference oracle for the other variants. Cost grows like n!, so it is limited to
    /// n &lt;= <see cref="LaplaceMaximumSize"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">The matrix is larger than <see cref="LaplaceMaximumSize"/>.</exception>
    public static T DeterminantLaplace<T>(Matrix<T> matrix)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("take the determinant of");
        if (matrix.RowCount > LaplaceMaximumSize)
        {
            throw new BeyondCapabilityException(
                $"Cofactor expansion of a {matrix.Shape} matrix is limited to size {LaplaceMaximumSize} (its cost grows like n!); use Determinant, DeterminantBareiss or DeterminantBerkowitz.");
        }

        return LaplaceCore(matrix);
    }

    private static T LaplaceCore<T>(Matrix<T> matrix)
        where T : IRingElement<T>
    {
        var n = matrix.RowCount;
        var columns = Enumerable.Range(0, n).ToArray();
        return LaplaceRecursive(matrix, 0, columns);
    }

    // Expands along row `row` using the remaining columns; the sign follows the position within the remaining list.
    private static T LaplaceRecursive<T>(Matrix<T> matrix, int row, int[] columns)
        where T : IRingElement<T>
    {
        if (columns.Length == 0)
        {
            return T.One;
        }

        if (columns.Length == 1)
        {
            return matrix.At(row, columns[0]);
        }

        var sum = T.Zero;
        for (var k = 0; k < columns.Length; k++)
        {
            var entry = matrix.At(row, columns[k]);
            if (entry.IsZero)
            {
                continue;
            }

            var rest = new int[columns.Length - 1];
            Array.Copy(columns, 0, rest, 0, k);
            Array.Copy(columns, k + 1, rest, k, columns.Length - k - 1);
            var term = entry * LaplaceRecursive(matrix, row + 1, rest);
            sum = (k & 1) == 0 ? sum + term : sum - term;
        }

        return sum;
    }

    private static T SignOfSize<T>(int n)
        where T : IRingElement<T> => (n & 1) == 0 ? T.One : -T.One;

    /// <summary>
    /// Berkowitz's algorithm: the coefficients of det(λI - A), HIGHEST degree first (index 0 holds 1).
    /// For each leading block A_{r+1} = [[A_r, S], [R, a]] the new coefficient vector is the lower triangular
    /// Toeplitz matrix with first column (1, -a, -R S, -R A_r S, ..., -R A_r^(r-1) S) times the old one.
    /// </summary>
    internal static T[] BerkowitzCore<T>(Matrix<T> matrix)
        where T : IRingElement<T>
    {
        var n = matrix.RowCount;
        var current = new[] { T.One };
        for (var r = 0; r < n; r++)
        {
            // Toeplitz column t of length r + 2.
            var t = new T[r + 2];
            t[0] = T.One;
            t[1] = -matrix.At(r, r);
            // v = A_r^k S, starting with S (column r, rows 0..r-1).
            var v = new T[r];
            for (var i = 0; i < r; i++)
            {
                v[i] = matrix.At(i, r);
            }

            for (var k = 2; k < r + 2; k++)
            {
                var dot = T.Zero;
                for (var i = 0; i < r; i++)
                {
                    dot += matrix.At(r, i) * v[i];
                }

                t[k] = -dot;
                if (k < r + 1)
                {
                    var next = new T[r];
                    for (var i = 0; i < r; i++)
                    {
                        var sum = T.Zero;
                        for (var j = 0; j < r; j++)
                        {
                            sum += matrix.At(i, j) * v[j];
                        }

                        next[i] = sum;
                    }

                    v = next;
                }
            }

            // new = T * current, T of size (r + 2) x (r + 1) with T[i][j] = t[i - j].
            var updated = new T[r + 2];
            for (var i = 0; i < r + 2; i++)
            {
                var sum = T.Zero;
                for (var j = 0; j <= Math.Min(i, r); j++)
                {
                    sum += t[i - j] * current[j];
                }

                updated[i] = sum;
            }

            current = updated;
        }

        return current;
    }

    // Resolves, once per scalar type, whether the Bareiss variant applies (its constraint cannot be stated on the dispatcher).
    private static class DeterminantChoice<T>
        where T : IRingElement<T>
    {
        public static readonly Func<Matrix<T>, T>? Bareiss = Create();

        private static Func<Matrix<T>, T>? Create()
        {
            var hasExactDivision = typeof(T).GetInterfaces().Any(
                i => i.IsGenericType && i.GetGenericTypeDefinition() == typeof(IExactDivision<>) && i.GetGenericArguments()[0] == typeof(T));
            if (!hasExactDivision)
            {
                return null;
            }

            var method = typeof(LinearAlgebra)
                .GetMethod(nameof(DeterminantBareiss), BindingFlags.Public | BindingFlags.Static)!
                .MakeGenericMethod(typeof(T));
            return method.CreateDelegate<Func<Matrix<T>, T>>();
        }
    }
}
