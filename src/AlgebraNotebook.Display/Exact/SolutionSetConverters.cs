using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Exact;

/// <summary>Display trees for <see cref="SolutionSet{T}"/>, written once for every field.</summary>
internal static class SolutionSetConverters
{
    /// <summary>
    /// "no solution"; "x = p" for a unique solution; otherwise "x ∈ p + span{v1, ..., vk}" with the particular solution
    /// p (free unknowns zero) and the null space basis as column matrices.
    /// </summary>
    public static MathNode FromSolutionSet<T>(SolutionSet<T> solutions)
        where T : IFieldElement<T>
    {
        if (solutions.Particular is not { } particular)
        {
            return MathNodes.Text("no solution");
        }

        var unknown = MathNodes.Symbol("x");
        var particularNode = MathDisplay.ToTree(particular);
        if (solutions.IsUnique)
        {
            return MathNodes.Row(unknown, MathNodes.Operator("="), particularNode);
        }

        return MathNodes.Row(unknown, MathNodes.Operator("∈"),
            MathNodes.Sum(particularNode, EigenDecompositionConverters.Span(solutions.NullSpaceBasis)));
    }
}
