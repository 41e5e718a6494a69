using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Exact;

/// <summary>
/// Display trees for <see cref="Eigenvalue{T}"/> and <see cref="EigenDecomposition{T}"/>, written once for every field.
/// </summary>
/// <remarks>
/// The display tree has no table node and the renderers offer no extension point, so the decomposition's table is a
/// <see cref="MatrixNode"/> between square brackets whose first row holds the column headings as text. Words next to
/// formulas are always separated by an operator ("," or "="): MathML trims spaces at the ends of <c>mtext</c>, and
/// operators carry their own spacing in all three outputs.
/// </remarks>
internal static class EigenDecompositionConverters
{
    /// <summary>The eigenvalue symbol, the same λ as the variable of the characteristic polynomial.</summary>
    private static MathNode Lambda<T>()
        where T : IFieldElement<T> => MathNodes.Symbol(UnivariatePolynomial<T>.DefaultVariableName);

    /// <summary>"λ = 2, algebraic multiplicity = 2, eigenspace = span{(1, 0)ᵀ, (0, 1)ᵀ}" with column matrices.</summary>
    public static MathNode FromEigenvalue<T>(Eigenvalue<T> eigenvalue)
        where T : IFieldElement<T> => MathNodes.Row(
            Lambda<T>(), MathNodes.Operator("="), MathDisplay.ToTree(eigenvalue.Value),
            MathNodes.Operator(","), MathNodes.Text("algebraic multiplicity"), MathNodes.Operator("="),
            MathNodes.Integer(eigenvalue.AlgebraicMultiplicity),
            MathNodes.Operator(","), MathNodes.Text("eigenspace"), MathNodes.Operator("="),
            Span(eigenvalue.Eigenspace));

    /// <summary>
    /// A table with the columns eigenvalue, algebraic multiplicity and eigenspace basis (column matrices), one row per
    /// eigenvalue in the order of <see cref="EigenDecomposition{T}.Eigenvalues"/>, followed by the characteristic
    /// polynomial and, in words, whether the list is complete over the field (with the remaining factor when it is not)
    /// and, when complete, whether the matrix is diagonalisable.
    /// </summary>
    public static MathNode FromEigenDecomposition<T>(EigenDecomposition<T> decomposition)
        where T : IFieldElement<T>
    {
        var items = new List<MathNode>();
        if (decomposition.Eigenvalues.Count == 0)
        {
            items.Add(MathNodes.Text("no eigenvalues in the field"));
        }
        else
        {
            var rows = new List<IReadOnlyList<MathNode>>
            {
                new[] { MathNodes.Text("eigenvalue"), MathNodes.Text("algebraic multiplicity"), MathNodes.Text("eigenspace basis") },
            };
            foreach (var eigenvalue in decomposition.Eigenvalues)
            {
                rows.Add(new[]
                {
                    MathDisplay.ToTree(eigenvalue.Value),
                    MathNodes.Integer(eigenvalue.AlgebraicMultiplicity),
                    VectorList(eigenvalue.Eigenspace),
                });
            }

            items.Add(new MatrixNode(rows, FenceKind.Brackets));
        }

        items.Add(MathNodes.Operator(","));
        items.Add(MathNodes.Text("characteristic polynomial"));
        items.Add(MathNodes.Operator("="));
        items.Add(MathDisplay.ToTree(decomposition.CharacteristicPolynomial));
        items.Add(MathNodes.Operator(","));
        if (decomposition.IsComplete)
        {
            items.Add(MathNodes.Text("complete over this field"));
            items.Add(MathNodes.Operator(","));
            items.Add(MathNodes.Text(decomposition.IsDiagonalisable ? "diagonalisable" : "not diagonalisable"));
        }
        else
        {
            items.Add(MathNodes.Text("incomplete over this field"));
            items.Add(MathNodes.Operator(","));
            items.Add(MathNodes.Text("remaining factor without roots in the field"));
            items.Add(MathNodes.Operator("="));
            items.Add(MathDisplay.ToTree(decomposition.RemainingFactor));
        }

        return MathNodes.Row(items.ToArray());
    }

    /// <summary>span{v1, v2, ...} with the vectors as column matrices; the span of nothing is span{}.</summary>
    internal static MathNode Span<T>(IReadOnlyList<Matrix<T>> vectors)
        where T : IRingElement<T> =>
        MathNodes.Row(MathNodes.Upright("span"), MathNodes.Fenced(VectorList(vectors), FenceKind.Braces));

    /// <summary>The vectors as column matrices separated by commas.</summary>
    internal static MathNode VectorList<T>(IReadOnlyList<Matrix<T>> vectors)
        where T : IRingElement<T>
    {
        var items = new List<MathNode>();
        foreach (var vector in vectors)
        {
            if (items.Count > 0)
            {
                items.Add(MathNodes.Operator(","));
            }

            items.Add(MathDisplay.ToTree(vector));
        }

        return MathNodes.Row(items.ToArray());
    }
}
