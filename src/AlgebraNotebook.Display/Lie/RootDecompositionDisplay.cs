using AlgebraNotebook.Algebras;
using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// A root decomposition g = h ⊕ Σ g_α as a fact table: the rank (dimension of the Cartan subalgebra h), whether it is
/// split over the scalars, the numbers of roots and positive roots, the type and the Cartan matrix
/// A_ij = 2(α_i, α_j)/(α_i, α_i) (row i = coroot i) when the decomposition is split, and the note.
/// </summary>
internal static class RootDecompositionDisplay
{
    /// <summary>The fact table described on the class.</summary>
    public static MathNode FromRootDecomposition<T>(RootDecomposition<T> decomposition)
        where T : IFieldElement<T>
    {
        var rows = new List<IReadOnlyList<MathNode>>();
        void Fact(string words, MathNode value) => rows.Add([MathNodes.Text(words), value]);

        Fact("rank (Cartan subalgebra dimension)", MathNodes.Integer(decomposition.Rank));
        Fact("Cartan subalgebra basis", MathNodes.Text(string.Join(", ", decomposition.CartanSubalgebra)));
        Fact("split over the scalars", MathNodes.Text(decomposition.IsSplit ? "yes" : "no"));
        Fact("roots", MathNodes.Integer(decomposition.Roots.Count));
        Fact("positive roots", MathNodes.Integer(decomposition.PositiveRoots.Count));
        if (decomposition.Type is { } type)
        {
            Fact("type", CartanTypeDisplay.ToTree(type));
        }

        if (decomposition.CartanMatrix is { } cartan)
        {
            Fact("Cartan matrix", ConverterRegistry.ToTree(cartan));
        }

        if (!string.IsNullOrWhiteSpace(decomposition.Note))
        {
            Fact("note", MathNodes.Text(decomposition.Note));
        }

        return new MatrixNode(rows, FenceKind.Brackets);
    }
}
