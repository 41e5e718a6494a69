using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Exact;

/// <summary>Display trees for <see cref="QuotientRing{T}"/> and <see cref="GroebnerStatistics"/>.</summary>
/// <remarks>
/// Like the eigenvalue table, the ring is shown as a <see cref="MatrixNode"/> in square brackets with text in its
/// first column, because the display tree has no table node and the renderers offer no extension point.
/// </remarks>
internal static class QuotientRingConverters
{
    /// <summary>
    /// A table of three rows: the relations as equations p = 0 (in the order given, "none" when there are none), the
    /// reduced Groebner basis as a set in its documented order, and the monomial order in words.
    /// </summary>
    public static MathNode FromQuotientRing<T>(QuotientRing<T> ring)
        where T : IFieldElement<T>
    {
        var relations = new List<MathNode>();
        foreach (var relation in ring.Relations)
        {
            if (relations.Count > 0)
            {
                relations.Add(MathNodes.Operator(","));
            }

            relations.Add(MathNodes.Row(MathDisplay.ToTree(relation), MathNodes.Operator("="), MathNodes.Zero));
        }

        var basis = new List<MathNode>();
        foreach (var element in ring.GroebnerBasis)
        {
            if (basis.Count > 0)
            {
                basis.Add(MathNodes.Operator(","));
            }

            basis.Add(MathDisplay.ToTree(element));
        }

        var rows = new IReadOnlyList<MathNode>[]
        {
            new[] { MathNodes.Text("relations"), relations.Count == 0 ? MathNodes.Text("none") : MathNodes.Row(relations.ToArray()) },
            new[] { MathNodes.Text("Groebner basis"), MathNodes.Fenced(MathNodes.Row(basis.ToArray()), FenceKind.Braces) },
            new[] { MathNodes.Text("monomial order"), MathNodes.Text(ring.Order.ToString()) },
        };
        return new MatrixNode(rows, FenceKind.Brackets);
    }

    /// <summary>"S-pairs created = 3, S-pairs reduced = 2, reductions to zero = 1, polynomials added = 1".</summary>
    public static MathNode FromGroebnerStatistics(GroebnerStatistics statistics)
    {
        ArgumentNullException.ThrowIfNull(statistics);
        return MathNodes.Row(
            MathNodes.Text("S-pairs created"), MathNodes.Operator("="), MathNodes.Integer(statistics.PairsCreated),
            MathNodes.Operator(","), MathNodes.Text("S-pairs reduced"), MathNodes.Operator("="), MathNodes.Integer(statistics.PairsReduced),
            MathNodes.Operator(","), MathNodes.Text("reductions to zero"), MathNodes.Operator("="), MathNodes.Integer(statistics.ZeroReductions),
            MathNodes.Operator(","), MathNodes.Text("polynomials added"), MathNodes.Operator("="), MathNodes.Integer(statistics.PolynomialsAdded));
    }
}
