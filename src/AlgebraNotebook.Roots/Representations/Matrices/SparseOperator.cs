using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations.Matrices;

/// <summary>A square matrix stored by columns as (row, value) maps; weight-basis operators are very sparse.</summary>
internal sealed class SparseOperator
{
    private readonly Dictionary<int, Rational>[] _columns;

    internal SparseOperator(int size)
    {
        _columns = new Dictionary<int, Rational>[size];
        for (var j = 0; j < size; j++)
        {
            _columns[j] = new Dictionary<int, Rational>();
        }
    }

    internal int Size => _columns.Length;

    internal IReadOnlyDictionary<int, Rational> Column(int column) => _columns[column];

    /// <summary>The operator with the given (row, column, value) entries; repeated positions add up.</summary>
    internal static SparseOperator FromEntries(int size, IReadOnlyList<(int Row, int Column, Rational Value)> entries)
    {
        var op = new SparseOperator(size);
        foreach (var (row, column, value) in entries)
        {
            op.Add(row, column, value);
        }

        return op;
    }

    internal void Add(int row, int column, Rational value)
    {
        if (value.IsZero)
        {
            return;
        }

        var col = _columns[column];
        var sum = col.TryGetValue(row, out var old) ? old + value : value;
        if (sum.IsZero)
        {
            col.Remove(row);
        }
        else
        {
            col[row] = sum;
        }
    }

    internal bool IsZero => Array.TrueForAll(_columns, c => c.Count == 0);

    /// <summary>this * other.</summary>
    internal SparseOperator Times(SparseOperator other)
    {
        var r = new SparseOperator(Size);
        for (var j = 0; j < Size; j++)
        {
            foreach (var (k, y) in other._columns[j])
            {
                foreach (var (i, x) in _columns[k])
                {
                    r.Add(i, j, x * y);
                }
            }
        }

        return r;
    }

    /// <summary>a * this + b * other.</summary>
    internal SparseOperator Combine(Rational a, SparseOperator other, Rational b)
    {
        var r = new SparseOperator(Size);
        for (var j = 0; j < Size; j++)
        {
            foreach (var (i, x) in _columns[j])
            {
                r.Add(i, j, a * x);
            }

            foreach (var (i, y) in other._columns[j])
            {
                r.Add(i, j, b * y);
            }
        }

        return r;
    }

    internal static SparseOperator Commutator(SparseOperator x, SparseOperator y) =>
        x.Times(y).Combine(Rational.One, y.Times(x), -Rational.One);

    internal Matrix<Rational> ToMatrix()
    {
        var rows = new Rational[Size][];
        for (var i = 0; i < Size; i++)
        {
            rows[i] = new Rational[Size];
        }

        for (var j = 0; j < Size; j++)
        {
            foreach (var (i, x) in _columns[j])
            {
                rows[i][j] = x;
            }
        }

        return Matrix<Rational>.FromRows(rows);
    }

    /// <summary>The factor c with other = c * this, read at the first non-zero entry of this (verified by the caller).</summary>
    internal Rational RatioTo(SparseOperator other)
    {
        for (var j = 0; j < Size; j++)
        {
            foreach (var (i, x) in _columns[j])
            {
                return (other._columns[j].TryGetValue(i, out var y) ? y : Rational.Zero) / x;
            }
        }

        return Rational.Zero;
    }

    internal bool SameAs(SparseOperator other)
    {
        for (var j = 0; j < Size; j++)
        {
            var a = _columns[j];
            var b = other._columns[j];
            if (a.Count != b.Count)
            {
                return false;
            }

            foreach (var (i, x) in a)
            {
                if (!b.TryGetValue(i, out var y) || x != y)
                {
                    return false;
                }
            }
        }

        return true;
    }
}
