using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// Exact linear algebra on <see cref="Matrix{T}"/>: row reduction, rank, null and column spaces, linear systems,
/// inverses, determinants (several named variants), characteristic and minimal polynomials.
/// Field operations need <c>T : IFieldElement&lt;T&gt;</c>; the division-free variants work over any commutative ring.
/// </summary>
public static partial class LinearAlgebra
{
    /// <summary>
    /// The reduced row echelon form (Gauss-Jordan elimination): every non-zero row starts with a 1 (its pivot),
    /// each pivot column is zero apart from its pivot, pivots move strictly right going down, zero rows are at the bottom.
    /// Unique for a given matrix. Cost O(m n min(m, n)) field operations.
    /// </summary>
    public static Matrix<T> ReducedRowEchelonForm<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        var (rows, _) = ReduceCore(matrix);
        return FromJagged(rows, matrix.RowCount, matrix.ColumnCount);
    }

    /// <summary>The zero-based pivot columns of the reduced row echelon form, in increasing order.</summary>
    public static IReadOnlyList<int> PivotColumns<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        return ReduceCore(matrix).Pivots;
    }

    /// <summary>The rank (dimension of the column space), from row reduction.</summary>
    public static int Rank<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        return ReduceCore(matrix).Pivots.Count;
    }

    /// <summary>
    /// A basis of the null space {x : A x = 0}, as n x 1 column vectors. Canonical: one vector per non-pivot column f
    /// of the reduced row echelon form, in increasing f, with entry 1 at position f, 0 at the other non-pivot positions
    /// and minus the reduced entries at the pivot positions. Empty when A has full column rank.
    /// </summary>
    public static IReadOnlyList<Matrix<T>> NullSpace<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        var (rows, pivots) = ReduceCore(matrix);
        return NullSpaceFromReduced(rows, pivots, matrix.ColumnCount);
    }

    /// <summary>
    /// A basis of the column space: the columns of the original matrix at the pivot columns of its reduced row
    /// echelon form (so the basis vectors are columns of A, in order), as m x 1 column vectors.
    /// </summary>
    public static IReadOnlyList<Matrix<T>> ColumnSpace<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        return ReduceCore(matrix).Pivots.Select(matrix.Column).ToArray();
    }

    /// <summary>
    /// The unique solution X of A X = B (B may have several columns, solved together).
    /// </summary>
    /// <exception cref="ExactArgumentException">
    /// The row counts of A and B differ; or the system has no solution (the message gives rank A and rank [A | B]);
    /// or the solution is not unique (rank A is below the number of unknowns; use <see cref="SolveAll{T}"/>).
    /// </exception>
    public static Matrix<T> Solve<T>(Matrix<T> a, Matrix<T> b)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        CheckRightHandSide(a, b);
        var n = a.ColumnCount;
        var (rows, pivots) = ReduceCore(Augment(a, b));
        var rankA = pivots.Count(p => p < n);
        if (pivots.Count > rankA)
        {
            throw new ExactArgumentException(
                $"The system A X = B with A {a.Shape} and B {b.Shape} has no solution: rank A = {rankA} but rank [A | B] = {pivots.Count}.",
                nameof(b));
        }

        if (rankA < n)
        {
            throw new ExactArgumentException(
                $"The system A X = B with A {a.Shape} has infinitely many solutions: rank A = {rankA} is below the {n} unknowns, so the null space has dimension {n - rankA}. Use SolveAll for the general solution.",
                nameof(a));
        }

        return Matrix<T>.Create(n, b.ColumnCount, (i, j) => rows[i][n + j]);
    }

    /// <summary>
    /// Every solution of A x = b for a single right-hand column b: a particular solution (free unknowns set to zero)
    /// plus the null space basis of A, or an empty set when the system is inconsistent.
    /// </summary>
    /// <exception cref="ExactArgumentException">b is not a column vector with as many rows as A.</exception>
    public static SolutionSet<T> SolveAll<T>(Matrix<T> a, Matrix<T> b)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        CheckRightHandSide(a, b);
        if (b.ColumnCount != 1)
        {
            throw new ExactArgumentException($"SolveAll needs a single right-hand column, but b is a {b.Shape} matrix.", nameof(b));
        }

        var n = a.ColumnCount;
        var (rows, pivots) = ReduceCore(Augment(a, b));
        var rankA = pivots.Count(p => p < n);
        var aRows = rows.Select(r => r[..n]).ToArray();
        var nullSpace = NullSpaceFromReduced(aRows, pivots.Where(p => p < n).ToList(), n);
        if (pivots.Count > rankA)
        {
            return new SolutionSet<T>(null, nullSpace, rankA);
        }

        var particular = new T[n];
        Array.Fill(particular, T.Zero);
        for (var r = 0; r < rankA; r++)
        {
            particular[pivots[r]] = rows[r][n];
        }

        return new SolutionSet<T>(Matrix<T>.ColumnVector(particular), nullSpace, rankA);
    }

    /// <summary>The inverse by Gauss-Jordan elimination on [A | I].</summary>
    /// <exception cref="ExactArgumentException">The matrix is not square, or it is singular (the message gives its rank).</exception>
    public static Matrix<T> Inverse<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("invert");
        var n = matrix.RowCount;
        var (rows, pivots) = ReduceCore(Augment(matrix, Matrix<T>.Identity(n)));
        var rank = pivots.Count(p => p < n);
        if (rank < n)
        {
            throw new ExactArgumentException(
                $"The {matrix.Shape} matrix is singular (rank {rank} < {n}) and has no inverse.", nameof(matrix));
        }

        return Matrix<T>.Create(n, n, (i, j) => rows[i][n + j]);
    }

    /// <summary>True when the matrix is square and of full rank.</summary>
    public static bool IsInvertible<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        return matrix.IsSquare && Rank(matrix) == matrix.RowCount;
    }

    private static void CheckRightHandSide<T>(Matrix<T> a, Matrix<T> b)
        where T : IRingElement<T>
    {
        if (a.RowCount != b.RowCount)
        {
            throw new ExactArgumentException(
                $"Cannot solve A X = B with A a {a.Shape} matrix and B a {b.Shape} matrix: the row counts differ.", nameof(b));
        }
    }

    internal static Matrix<T> Augment<T>(Matrix<T> left, Matrix<T> right)
        where T : IRingElement<T> =>
        Matrix<T>.Create(
            left.RowCount,
            left.ColumnCount + right.ColumnCount,
            (i, j) => j < left.ColumnCount ? left.At(i, j) : right.At(i, j - left.ColumnCount));

    /// <summary>Gauss-Jordan elimination to reduced row echelon form; returns the rows and the pivot columns.</summary>
    internal static (T[][] Rows, List<int> Pivots) ReduceCore<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        var m = matrix.RowCount;
        var n = matrix.ColumnCount;
        var rows = new T[m][];
        for (var i = 0; i < m; i++)
        {
            rows[i] = new T[n];
            for (var j = 0; j < n; j++)
            {
                rows[i][j] = matrix.At(i, j);
            }
        }

        var pivots = new List<int>();
        var pivotRow = 0;
        for (var column = 0; column < n && pivotRow < m; column++)
        {
            var found = -1;
            for (var i = pivotRow; i < m; i++)
            {
                if (!rows[i][column].IsZero)
                {
                    found = i;
                    break;
                }
            }

            if (found < 0)
            {
                continue;
            }

            (rows[pivotRow], rows[found]) = (rows[found], rows[pivotRow]);
            var pivot = rows[pivotRow];
            var inverse = pivot[column].Reciprocal();
            for (var j = column; j < n; j++)
            {
                pivot[j] *= inverse;
            }

            for (var i = 0; i < m; i++)
            {
                if (i == pivotRow || rows[i][column].IsZero)
                {
                    continue;
                }

                var factor = rows[i][column];
                var row = rows[i];
                for (var j = column; j < n; j++)
                {
                    if (!pivot[j].IsZero)
                    {
                        row[j] -= factor * pivot[j];
                    }
                }
            }

            pivots.Add(column);
            pivotRow++;
        }

        return (rows, pivots);
    }

    private static Matrix<T>[] NullSpaceFromReduced<T>(T[][] rows, IReadOnlyList<int> pivots, int columns)
        where T : IFieldElement<T>
    {
        var isPivot = new bool[columns];
        foreach (var p in pivots)
        {
            isPivot[p] = true;
        }

        var basis = new List<Matrix<T>>();
        for (var free = 0; free < columns; free++)
        {
            if (isPivot[free])
            {
                continue;
            }

            var vector = new T[columns];
            Array.Fill(vector, T.Zero);
            vector[free] = T.One;
            for (var r = 0; r < pivots.Count; r++)
            {
                vector[pivots[r]] = -rows[r][free];
            }

            basis.Add(Matrix<T>.ColumnVector(vector));
        }

        return basis.ToArray();
    }

    private static Matrix<T> FromJagged<T>(T[][] rows, int m, int n)
        where T : IRingElement<T> => Matrix<T>.Create(m, n, (i, j) => rows[i][j]);
}
