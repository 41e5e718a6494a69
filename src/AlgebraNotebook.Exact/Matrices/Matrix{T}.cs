using System.Text;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// An immutable dense matrix over a commutative ring. Indices are zero-based, (row, column); entries are stored
/// row by row. Zero-sized matrices (0 rows or 0 columns) are allowed; the 0x0 matrix has determinant 1.
/// </summary>
/// <example><c>Matrix.FromRows&lt;Rational&gt;([1, 2], [3, 4]) * Matrix&lt;Rational&gt;.Identity(2)</c></example>
/// <typeparam name="T">The scalar type.</typeparam>
public sealed partial class Matrix<T> : IEquatable<Matrix<T>>
    where T : IRingElement<T>
{
    private readonly T[] _entries;

    /// <summary>Takes ownership of a row-major entry array of length rows*columns whose entries are canonical.</summary>
    internal Matrix(int rows, int columns, T[] entries)
    {
        RowCount = rows;
        ColumnCount = columns;
        _entries = entries;
    }

    /// <summary>The number of rows.</summary>
    public int RowCount { get; }

    /// <summary>The number of columns.</summary>
    public int ColumnCount { get; }

    /// <summary>True when the matrix has as many rows as columns.</summary>
    public bool IsSquare => RowCount == ColumnCount;

    /// <summary>The shape as text, "rows x columns" (e.g. "2x3"), as used in error messages.</summary>
    public string Shape => $"{RowCount}x{ColumnCount}";

    /// <summary>The entry in row <paramref name="row"/> and column <paramref name="column"/> (both zero-based).</summary>
    /// <exception cref="ExactArgumentException">An index is out of range.</exception>
    public T this[int row, int column]
    {
        get
        {
            if ((uint)row >= (uint)RowCount || (uint)column >= (uint)ColumnCount)
            {
                throw new ExactArgumentException(
                    $"Index ({row}, {column}) is outside the {Shape} matrix (indices are zero-based).", nameof(row));
            }

            return _entries[row * ColumnCount + column];
        }
    }

    /// <summary>Entry access without range checks, for the algorithms of this assembly.</summary>
    internal T At(int row, int column) => _entries[row * ColumnCount + column];

    /// <summary>True when every entry is zero (also true for zero-sized matrices).</summary>
    public bool IsZero => Array.TrueForAll(_entries, e => e.IsZero);

    /// <summary>True when the matrix is square and equals its transpose.</summary>
    public bool IsSymmetric => IsSquare && CheckPairs((a, b) => a.Equals(b));

    /// <summary>True when the matrix is square and equals the negative of its transpose (so the diagonal is zero).</summary>
    public bool IsAntisymmetric => IsSquare && CheckPairs((a, b) => a.Equals(-b));

    /// <summary>
    /// True when the matrix is square and equals its conjugate transpose (uses <see cref="IRingElement{T}.Conjugate"/>;
    /// over a real type this is the same as <see cref="IsSymmetric"/>).
    /// </summary>
    public bool IsHermitian => IsSquare && CheckPairs((a, b) => a.Equals(b.Conjugate()));

    private bool CheckPairs(Func<T, T, bool> relation)
    {
        for (var i = 0; i < RowCount; i++)
        {
            for (var j = i; j < ColumnCount; j++)
            {
                if (!relation(At(i, j), At(j, i)))
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>
    /// Builds a matrix from its rows; every row must have the same length. An empty array gives the 0x0 matrix.
    /// The arrays are copied.
    /// </summary>
    /// <exception cref="ExactArgumentException">The rows have different lengths (the message names the first offending row).</exception>
    public static Matrix<T> FromRows(T[][] rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        if (rows.Length == 0)
        {
            return new Matrix<T>(0, 0, []);
        }

        ArgumentNullException.ThrowIfNull(rows[0], "rows[0]");
        var columns = rows[0].Length;
        var entries = new T[rows.Length * columns];
        for (var i = 0; i < rows.Length; i++)
        {
            var row = rows[i] ?? throw new ExactArgumentException($"Row {i} of the matrix is null.", nameof(rows));
            if (row.Length != columns)
            {
                throw new ExactArgumentException(
                    $"Row {i} of the matrix has {row.Length} entries but row 0 has {columns}; all rows must have the same length.",
                    nameof(rows));
            }

            for (var j = 0; j < columns; j++)
            {
                entries[i * columns + j] = Canonical(row[j]);
            }
        }

        return new Matrix<T>(rows.Length, columns, entries);
    }

    /// <summary>Builds a matrix from its columns; every column must have the same length. The arrays are copied.</summary>
    /// <exception cref="ExactArgumentException">The columns have different lengths.</exception>
    public static Matrix<T> FromColumns(T[][] columns)
    {
        ArgumentNullException.ThrowIfNull(columns);
        if (columns.Length == 0)
        {
            return new Matrix<T>(0, 0, []);
        }

        var rows = columns[0]?.Length ?? throw new ExactArgumentException("Column 0 of the matrix is null.", nameof(columns));
        for (var j = 0; j < columns.Length; j++)
        {
            var column = columns[j] ?? throw new ExactArgumentException($"Column {j} of the matrix is null.", nameof(columns));
            if (column.Length != rows)
            {
                throw new ExactArgumentException(
                    $"Column {j} of the matrix has {column.Length} entries but column 0 has {rows}; all columns must have the same length.",
                    nameof(columns));
            }
        }

        return Create(rows, columns.Length, (i, j) => columns[j][i]);
    }

    /// <summary>A column vector (an n x 1 matrix) with the given entries.</summary>
    public static Matrix<T> ColumnVector(params T[] entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        return Create(entries.Length, 1, (i, _) => entries[i]);
    }

    /// <summary>The square matrix with the given diagonal entries and zeros elsewhere.</summary>
    public static Matrix<T> Diagonal(params T[] entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        return Create(entries.Length, entries.Length, (i, j) => i == j ? entries[i] : T.Zero);
    }

    /// <summary>The n x n identity matrix.</summary>
    /// <exception cref="ExactArgumentException"><paramref name="size"/> is negative.</exception>
    public static Matrix<T> Identity(int size)
    {
        CheckDimension(size, nameof(size));
        return Create(size, size, (i, j) => i == j ? T.One : T.Zero);
    }

    /// <summary>The zero matrix with the given shape.</summary>
    /// <exception cref="ExactArgumentException">A dimension is negative.</exception>
    public static Matrix<T> Zero(int rows, int columns)
    {
        CheckDimension(rows, nameof(rows));
        CheckDimension(columns, nameof(columns));
        return Create(rows, columns, (_, _) => T.Zero);
    }

    /// <summary>Builds a matrix whose entry (i, j) is <paramref name="entry"/>(i, j).</summary>
    /// <exception cref="ExactArgumentException">A dimension is negative.</exception>
    public static Matrix<T> FromFunction(int rows, int columns, Func<int, int, T> entry)
    {
        CheckDimension(rows, nameof(rows));
        CheckDimension(columns, nameof(columns));
        ArgumentNullException.ThrowIfNull(entry);
        return Create(rows, columns, entry);
    }

    internal static Matrix<T> Create(int rows, int columns, Func<int, int, T> entry)
    {
        var entries = new T[rows * columns];
        for (var i = 0; i < rows; i++)
        {
            for (var j = 0; j < columns; j++)
            {
                entries[i * columns + j] = Canonical(entry(i, j));
            }
        }

        return new Matrix<T>(rows, columns, entries);
    }

    // Reference-type scalars may arrive as null; the interface contract says default(T) means zero.
    private static T Canonical(T value) => value is null ? T.Zero : value;

    private static void CheckDimension(int value, string name)
    {
        if (value < 0)
        {
            throw new ExactArgumentException($"A matrix dimension must not be negative, but {name} is {value}.", name);
        }
    }

    /// <summary>Row <paramref name="row"/> as a 1 x n matrix.</summary>
    /// <exception cref="ExactArgumentException">The index is out of range.</exception>
    public Matrix<T> Row(int row)
    {
        if ((uint)row >= (uint)RowCount)
        {
            throw new ExactArgumentException($"Row index {row} is outside the {Shape} matrix (indices are zero-based).", nameof(row));
        }

        return Create(1, ColumnCount, (_, j) => At(row, j));
    }

    /// <summary>Column <paramref name="column"/> as an n x 1 matrix.</summary>
    /// <exception cref="ExactArgumentException">The index is out of range.</exception>
    public Matrix<T> Column(int column)
    {
        if ((uint)column >= (uint)ColumnCount)
        {
            throw new ExactArgumentException($"Column index {column} is outside the {Shape} matrix (indices are zero-based).", nameof(column));
        }

        return Create(RowCount, 1, (i, _) => At(i, column));
    }

    /// <summary>The entries of row <paramref name="row"/> as a new array.</summary>
    /// <exception cref="ExactArgumentException">The index is out of range.</exception>
    public T[] RowEntries(int row) => Row(row)._entries.ToArray();

    /// <summary>The entries of column <paramref name="column"/> as a new array.</summary>
    /// <exception cref="ExactArgumentException">The index is out of range.</exception>
    public T[] ColumnEntries(int column) => Column(column)._entries.ToArray();

    /// <summary>All rows as new arrays (the inverse of <see cref="FromRows"/>).</summary>
    public T[][] ToRowArrays()
    {
        var rows = new T[RowCount][];
        for (var i = 0; i < RowCount; i++)
        {
            rows[i] = _entries.AsSpan(i * ColumnCount, ColumnCount).ToArray();
        }

        return rows;
    }

    /// <summary>Applies <paramref name="map"/> to every entry (for example to view a rational matrix over the Gaussian rationals).</summary>
    public Matrix<TResult> Map<TResult>(Func<T, TResult> map)
        where TResult : IRingElement<TResult>
    {
        ArgumentNullException.ThrowIfNull(map);
        return Matrix<TResult>.Create(RowCount, ColumnCount, (i, j) => map(At(i, j)));
    }

    /// <summary>
    /// The submatrix with the given rows and columns, in the given order (indices zero-based, repetitions allowed).
    /// </summary>
    /// <exception cref="ExactArgumentException">An index is out of range.</exception>
    public Matrix<T> Submatrix(IReadOnlyList<int> rows, IReadOnlyList<int> columns)
    {
        ArgumentNullException.ThrowIfNull(rows);
        ArgumentNullException.ThrowIfNull(columns);
        foreach (var r in rows)
        {
            if ((uint)r >= (uint)RowCount)
            {
                throw new ExactArgumentException($"Row index {r} is outside the {Shape} matrix.", nameof(rows));
            }
        }

        foreach (var c in columns)
        {
            if ((uint)c >= (uint)ColumnCount)
            {
                throw new ExactArgumentException($"Column index {c} is outside the {Shape} matrix.", nameof(columns));
            }
        }

        return Create(rows.Count, columns.Count, (i, j) => At(rows[i], columns[j]));
    }

    /// <inheritdoc />
    public bool Equals(Matrix<T>? other)
    {
        if (other is null)
        {
            return false;
        }

        if (ReferenceEquals(this, other))
        {
            return true;
        }

        if (RowCount != other.RowCount || ColumnCount != other.ColumnCount)
        {
            return false;
        }

        for (var k = 0; k < _entries.Length; k++)
        {
            if (!_entries[k].Equals(other._entries[k]))
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Matrix<T> other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.Add(RowCount);
        hash.Add(ColumnCount);
        foreach (var e in _entries)
        {
            hash.Add(e);
        }

        return hash.ToHashCode();
    }

    /// <summary>Entry-wise equality of two matrices of the same shape.</summary>
    public static bool operator ==(Matrix<T>? left, Matrix<T>? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Negation of <c>==</c>.</summary>
    public static bool operator !=(Matrix<T>? left, Matrix<T>? right) => !(left == right);

    /// <summary>
    /// Plain text, row by row, in the form that <see cref="Matrix.Parse{T}(string, Func{string, T})"/> reads back:
    /// "[[1, 2], [3/4, -i]]". The 0x0 matrix prints as "[]"; a matrix with rows but no columns as "[[], []]".
    /// </summary>
    public override string ToString()
    {
        var text = new StringBuilder("[");
        for (var i = 0; i < RowCount; i++)
        {
            if (i > 0)
            {
                text.Append(", ");
            }

            text.Append('[');
            for (var j = 0; j < ColumnCount; j++)
            {
                if (j > 0)
                {
                    text.Append(", ");
                }

                text.Append(At(i, j).ToString());
            }

            text.Append(']');
        }

        return text.Append(']').ToString();
    }
}
