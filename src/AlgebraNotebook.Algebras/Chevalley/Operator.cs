using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Chevalley;

/// <summary>A sparse square matrix by columns, for the commutators of root vectors in the adjoint module.</summary>
internal sealed class Operator
{
    private readonly Dictionary<int, Rational>[] _columns;

    internal Operator(int size)
    {
        _columns = new Dictionary<int, Rational>[size];
        for (var j = 0; j < size; j++)
        {
            _columns[j] = new Dictionary<int, Rational>();
        }
    }

    internal int Size => _columns.Length;

    internal bool IsZero => Array.TrueForAll(_columns, c => c.Count == 0);

    internal static Operator FromEntries(int size, IReadOnlyList<(int Row, int Column, Rational Value)> entries)
    {
        var op = new Operator(size);
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

    internal Operator Times(Operator other)
    {
        var r = new Operator(Size);
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

    internal Operator Combine(Rational a, Operator other, Rational b)
    {
        var r = new Operator(Size);
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

    internal static Operator Commutator(Operator x, Operator y) => x.Times(y).Combine(Rational.One, y.Times(x), -Rational.One);

    /// <summary>The factor c with other = c * this, read at the first non-zero entry of this (verified by the caller).</summary>
    internal Rational RatioTo(Operator other)
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

    internal bool SameAs(Operator other)
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
