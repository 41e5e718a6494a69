using System.Text;
using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

/// <summary>
/// Structure constants of a span of operators closed under commutators: [A_i, A_j] = sum_k c_ij^k A_k, with
/// c_ij^k = -c_ji^k. Indices are zero-based in basis order.
/// </summary>
/// <typeparam name="T">The field of constants.</typeparam>
public sealed class StructureConstantTable<T>
    where T : IFieldElement<T>
{
    private readonly T[,,] _c;

    internal StructureConstantTable(IReadOnlyList<string> names, T[,,] constants)
    {
        BasisNames = names;
        _c = constants;
    }

    /// <summary>The basis names in order.</summary>
    public IReadOnlyList<string> BasisNames { get; }

    /// <summary>The dimension.</summary>
    public int Dimension => BasisNames.Count;

    /// <summary>c_ij^k, the coefficient of A_k in [A_i, A_j].</summary>
    /// <exception cref="ExactArgumentException">An index is out of range.</exception>
    public T this[int i, int j, int k]
    {
        get
        {
            foreach (var (index, name) in new[] { (i, "i"), (j, "j"), (k, "k") })
            {
                if (index < 0 || index >= Dimension)
                {
                    throw new ExactArgumentException($"Index {name} = {index} is outside 0..{Dimension - 1}.", name);
                }
            }

            return _c[i, j, k];
        }
    }

    /// <summary>
    /// The Lie algebra with these structure constants and basis names (checked for antisymmetry and the Jacobi identity
    /// by <see cref="LieAlgebra{T}.FromStructureConstants"/>; commutators of operators always pass).
    /// </summary>
    /// <param name="label">Optional description for display, e.g. "rotations".</param>
    public LieAlgebra<T> ToLieAlgebra(string? label = null) => LieAlgebra<T>.FromStructureConstants(BasisNames, ToTensor(), label);

    /// <summary>A copy of the tensor: element [i, j, k] is c_ij^k.</summary>
    public T[,,] ToTensor() => (T[,,])_c.Clone();

    /// <summary>The bracket [A_i, A_j] as text in the basis names, e.g. "[L_x, L_y] = L_z" or "= 0".</summary>
    /// <exception cref="ExactArgumentException">An index is out of range.</exception>
    public string BracketText(int i, int j)
    {
        _ = this[i, j, 0];
        var terms = new StringBuilder();
        for (var k = 0; k < Dimension; k++)
        {
            var c = _c[i, j, k];
            if (c.IsZero)
            {
                continue;
            }

            var p = Polynomial<T>.Constant(c);
            var text = c.IsOne ? BasisNames[k] : (-c).IsOne ? "-" + BasisNames[k] : $"{p}*{BasisNames[k]}";
            if (terms.Length == 0)
            {
                terms.Append(text);
            }
            else if (text.StartsWith('-'))
            {
                terms.Append(" - ").Append(text.AsSpan(1));
            }
            else
            {
                terms.Append(" + ").Append(text);
            }
        }

        return $"[{BasisNames[i]}, {BasisNames[j]}] = {(terms.Length == 0 ? "0" : terms.ToString())}";
    }

    /// <summary>One line per pair i &lt; j with a non-zero bracket; "all brackets vanish (abelian)" when there is none.</summary>
    public override string ToString()
    {
        var lines = new List<string>();
        for (var i = 0; i < Dimension; i++)
        {
            for (var j = i + 1; j < Dimension; j++)
            {
                var nonzero = false;
                for (var k = 0; k < Dimension; k++)
                {
                    nonzero |= !_c[i, j, k].IsZero;
                }

                if (nonzero)
                {
                    lines.Add(BracketText(i, j));
                }
            }
        }

        return lines.Count == 0 ? "all brackets vanish (abelian)" : string.Join(Environment.NewLine, lines);
    }
}
