using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations.Matrices;

/// <summary>
/// Builds the irreducible module level by level (depth below the highest weight): candidates f_i v, their images under
/// all e_j, and a row reduction that keeps the independent ones (see <see cref="RepresentationMatrices"/>).
/// </summary>
internal sealed class ModuleBuilder
{
    private readonly RootSystem _system;
    private readonly Weight _highest;
    private readonly int _rank;
    private readonly Weight[] _simpleRoots;
    private readonly Dictionary<Weight, List<int>> _spaces = new();
    private readonly List<Dictionary<int, Rational>>[] _e;
    private readonly List<Dictionary<int, Rational>>[] _f;

    internal ModuleBuilder(RootSystem system, Weight highest)
    {
        _system = system;
        _highest = highest;
        _rank = system.Rank;
        _simpleRoots = system.SimpleRoots.Select(r => r.AsWeight).ToArray();
        _e = new List<Dictionary<int, Rational>>[_rank];
        _f = new List<Dictionary<int, Rational>>[_rank];
        for (var i = 0; i < _rank; i++)
        {
            _e[i] = [];
            _f[i] = [];
        }
    }

    internal List<Weight> Weights { get; } = [];

    internal void Run()
    {
        AddVector(_highest);
        var level = new List<Weight> { _highest };
        while (level.Count > 0)
        {
            var next = new List<Weight>();
            var seen = new HashSet<Weight>();
            foreach (var mu in level)
            {
                for (var i = 0; i < _rank; i++)
                {
                    var nu = mu - _simpleRoots[i];
                    if (seen.Add(nu))
                    {
                        next.Add(nu);
                    }
                }
            }

            var created = new List<Weight>();
            foreach (var nu in next)
            {
                if (BuildWeightSpace(nu))
                {
                    created.Add(nu);
                }
            }

            level = created;
        }
    }

    internal SparseOperator[] EOperators() => ToOperators(_e);

    internal SparseOperator[] FOperators() => ToOperators(_f);

    private SparseOperator[] ToOperators(List<Dictionary<int, Rational>>[] maps)
    {
        var n = Weights.Count;
        var result = new SparseOperator[_rank];
        for (var i = 0; i < _rank; i++)
        {
            var op = new SparseOperator(n);
            for (var v = 0; v < n; v++)
            {
                foreach (var (row, x) in maps[i][v])
                {
                    op.Add(row, v, x);
                }
            }

            result[i] = op;
        }

        return result;
    }

    private int AddVector(Weight weight)
    {
        var index = Weights.Count;
        Weights.Add(weight);
        if (!_spaces.TryGetValue(weight, out var list))
        {
            list = [];
            _spaces[weight] = list;
        }

        list.Add(index);
        for (var i = 0; i < _rank; i++)
        {
            _e[i].Add(new Dictionary<int, Rational>());
            _f[i].Add(new Dictionary<int, Rational>());
        }

        return index;
    }

    /// <summary>Creates the basis of V_nu and the actions f_i: V_(nu+alpha_i) -> V_nu, e_j: V_nu -> V_(nu+alpha_j).</summary>
    private bool BuildWeightSpace(Weight nu)
    {
        // Targets: the weight spaces nu + alpha_j, stacked.
        var targetOffset = new int[_rank];
        var targetPosition = new Dictionary<int, int>[_rank];
        var rows = 0;
        for (var j = 0; j < _rank; j++)
        {
            targetOffset[j] = rows;
            targetPosition[j] = new Dictionary<int, int>();
            if (_spaces.TryGetValue(nu + _simpleRoots[j], out var space))
            {
                for (var k = 0; k < space.Count; k++)
                {
                    targetPosition[j][space[k]] = rows + k;
                }

                rows += space.Count;
            }
        }

        var candidates = new List<(int Node, int Vector)>();
        for (var i = 0; i < _rank; i++)
        {
            if (_spaces.TryGetValue(nu + _simpleRoots[i], out var space))
            {
                foreach (var v in space)
                {
                    candidates.Add((i, v));
                }
            }
        }

        if (candidates.Count == 0 || rows == 0)
        {
            return false;
        }

        var columns = new Dictionary<int, Rational>[candidates.Count];
        for (var k = 0; k < candidates.Count; k++)
        {
            var (i, v) = candidates[k];
            var column = new Dictionary<int, Rational>();
            for (var j = 0; j < _rank; j++)
            {
                // e_j f_i v = f_i e_j v + delta_ij <wt(v), alpha_i^vee> v
                foreach (var (w, c) in _e[j][v])
                {
                    foreach (var (u, d) in _f[i][w])
                    {
                        Accumulate(column, targetPosition[j][u], c * d);
                    }
                }

                if (i == j)
                {
                    Accumulate(column, targetPosition[j][v], new Rational(Weights[v][i]));
                }
            }

            columns[k] = column;
        }

        var matrix = Matrix<Rational>.FromFunction(rows, candidates.Count,
            (r, k) => columns[k].TryGetValue(r, out var x) ? x : Rational.Zero);
        var pivots = LinearAlgebra.PivotColumns(matrix);
        if (pivots.Count == 0)
        {
            return false;
        }

        var reduced = LinearAlgebra.ReducedRowEchelonForm(matrix);
        var newIndex = new int[pivots.Count];
        for (var p = 0; p < pivots.Count; p++)
        {
            var index = AddVector(nu);
            newIndex[p] = index;
            foreach (var (row, x) in columns[pivots[p]])
            {
                var j = NodeOfRow(targetOffset, row, rows);
                var space = _spaces[nu + _simpleRoots[j]];
                _e[j][index][space[row - targetOffset[j]]] = x;
            }
        }

        for (var k = 0; k < candidates.Count; k++)
        {
            var (i, v) = candidates[k];
            var target = _f[i][v];
            for (var p = 0; p < pivots.Count; p++)
            {
                var x = reduced[p, k];
                if (!x.IsZero)
                {
                    target[newIndex[p]] = x;
                }
            }
        }

        return true;
    }

    private int NodeOfRow(int[] offsets, int row, int rows)
    {
        for (var j = _rank - 1; j >= 0; j--)
        {
            var end = j == _rank - 1 ? rows : offsets[j + 1];
            if (row >= offsets[j] && row < end)
            {
                return j;
            }
        }

        throw new InvalidOperationException("Row outside the target weight spaces.");
    }

    private static void Accumulate(Dictionary<int, Rational> column, int row, Rational value)
    {
        if (value.IsZero)
        {
            return;
        }

        var sum = column.TryGetValue(row, out var old) ? old + value : value;
        if (sum.IsZero)
        {
            column.Remove(row);
        }
        else
        {
            column[row] = sum;
        }
    }
}
