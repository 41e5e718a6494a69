using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

/// <summary>
/// The span, with constant coefficients in <typeparamref name="T"/>, of named, linearly independent differential
/// operators over one ring. When every commutator [A_i, A_j] is again a constant-coefficient combination of the
/// A_k, the span is a Lie algebra with structure constants [A_i, A_j] = sum_k c_ij^k A_k
/// (<see cref="StructureConstants"/>).
/// </summary>
/// <remarks>
/// "Constant" means an element of <typeparamref name="T"/>: parameters such as hbar are symbols of the coefficient ring,
/// not constants, so rescale generators to remove them (e.g. use L_k / hbar) before asking for structure constants.
/// Linear (in)dependence is decided on normal forms, which are linear in the operator, so it is exact modulo relations.
/// </remarks>
/// <typeparam name="T">The field of constants.</typeparam>
public sealed class OperatorSpan<T>
    where T : IFieldElement<T>
{
    private readonly Dictionary<(Monomial Derivative, Monomial Coefficient), int> _rows = [];
    private readonly Matrix<T> _matrix;

    /// <summary>Creates the span of named operators over one ring.</summary>
    /// <exception cref="ExactArgumentException">The list is empty; names are empty or repeated; operators are over
    /// different rings; or they are linearly dependent over <typeparamref name="T"/> (the message names one dependent operator).</exception>
    public OperatorSpan(IReadOnlyList<(string Name, DifferentialOperator<T> Operator)> basis)
    {
        ArgumentNullException.ThrowIfNull(basis);
        if (basis.Count == 0)
        {
            throw new ExactArgumentException("An operator span needs at least one operator.", nameof(basis));
        }

        var names = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (name, op) in basis)
        {
            ArgumentNullException.ThrowIfNull(op, nameof(basis));
            if (string.IsNullOrWhiteSpace(name) || !names.Add(name))
            {
                throw new ExactArgumentException($"Operator names must be non-empty and distinct; \"{name}\" is not.", nameof(basis));
            }

            basis[0].Operator.RequireSameRing(op, nameof(basis));
        }

        Ring = basis[0].Operator.Ring;
        Names = basis.Select(b => b.Name).ToList().AsReadOnly();
        Operators = basis.Select(b => b.Operator).ToList().AsReadOnly();
        foreach (var op in Operators)
        {
            foreach (var key in Keys(op))
            {
                _rows.TryAdd(key.Key, _rows.Count);
            }
        }

        var columns = Operators.Select(ToColumn).ToArray();
        _matrix = Matrix.FromColumns(columns);
        for (var k = 1; k <= Operators.Count; k++)
        {
            var leading = Matrix.FromColumns(columns[..k]);
            if (LinearAlgebra.Rank(leading) < k)
            {
                throw new ExactArgumentException(
                    $"The operators are linearly dependent over the constants: {Names[k - 1]} = {Operators[k - 1]} is a combination of the operators before it.",
                    nameof(basis));
            }
        }
    }

    /// <summary>The common coefficient ring.</summary>
    public CoefficientRing<T> Ring { get; }

    /// <summary>The operator names in basis order.</summary>
    public IReadOnlyList<string> Names { get; }

    /// <summary>The operators in basis order.</summary>
    public IReadOnlyList<DifferentialOperator<T>> Operators { get; }

    /// <summary>The dimension of the span.</summary>
    public int Dimension => Operators.Count;

    /// <summary>
    /// The constants a_k with <paramref name="value"/> = sum_k a_k A_k, or null when the operator is not in the span.
    /// </summary>
    /// <exception cref="ExactArgumentException">The operator is over another ring.</exception>
    public T[]? TryExpress(DifferentialOperator<T> value)
    {
        Operators[0].RequireSameRing(value, nameof(value));
        var keys = Keys(value);
        if (keys.Any(k => !_rows.ContainsKey(k.Key)))
        {
            return null;
        }

        var rhs = new T[_rows.Count];
        Array.Fill(rhs, T.Zero);
        foreach (var (key, c) in keys)
        {
            rhs[_rows[key]] = c;
        }

        var solution = LinearAlgebra.SolveAll(_matrix, Matrix<T>.ColumnVector(rhs));
        if (!solution.HasSolution)
        {
            return null;
        }

        var x = solution.Particular!;
        return Enumerable.Range(0, Dimension).Select(i => x[i, 0]).ToArray();
    }

    /// <summary>
    /// Computes every commutator [A_i, A_j] (i &lt; j) and expresses it in the span. Element [i, j, k] of the
    /// returned table is c_ij^k, the coefficient of A_k in [A_i, A_j].
    /// </summary>
    /// <exception cref="ExactArgumentException">Some commutator is not a constant-coefficient combination of the span;
    /// the message names the pair and shows the commutator in normal form.</exception>
    public StructureConstantTable<T> StructureConstants()
    {
        var n = Dimension;
        var c = new T[n, n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                for (var k = 0; k < n; k++)
                {
                    c[i, j, k] = T.Zero;
                }
            }
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                var bracket = DifferentialOperator<T>.Commutator(Operators[i], Operators[j]);
                var a = TryExpress(bracket) ?? throw new ExactArgumentException(
                    $"The span does not close: [{Names[i]}, {Names[j]}] = {bracket} is not a constant-coefficient combination of {string.Join(", ", Names)}.",
                    nameof(Operators));
                for (var k = 0; k < n; k++)
                {
                    c[i, j, k] = a[k];
                    c[j, i, k] = -a[k];
                }
            }
        }

        return new StructureConstantTable<T>(Names, c);
    }

    /// <summary>
    /// The Lie algebra spanned by the operators: <see cref="StructureConstants"/> turned into a
    /// <see cref="LieAlgebra{T}"/> with the operator names as basis names.
    /// </summary>
    /// <param name="label">Optional description for display.</param>
    /// <exception cref="ExactArgumentException">Some commutator is not a constant-coefficient combination of the span
    /// (the message names the pair and shows the commutator).</exception>
    public LieAlgebra<T> ToLieAlgebra(string? label = null) => StructureConstants().ToLieAlgebra(label);

    private T[] ToColumn(DifferentialOperator<T> op)
    {
        var column = new T[_rows.Count];
        Array.Fill(column, T.Zero);
        foreach (var (key, c) in Keys(op))
        {
            column[_rows[key]] = c;
        }

        return column;
    }

    private static List<((Monomial Derivative, Monomial Coefficient) Key, T Value)> Keys(DifferentialOperator<T> op)
    {
        var list = new List<((Monomial, Monomial), T)>();
        foreach (var (d, p) in op.RawTerms)
        {
            foreach (var (m, c) in p.Terms)
            {
                list.Add(((d, m), c));
            }
        }

        return list;
    }
}
