using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Display.Lie;

/// <summary>Display tree for <see cref="Root"/>: the combination of simple roots, "α₁ + 2α₂ + α₃".</summary>
public static class RootDisplay
{
    /// <summary>sum_i c_i alpha_i over the non-zero coordinates, node numbers as subscripts (Bourbaki numbering).</summary>
    public static MathNode ToTree(Root root)
    {
        ArgumentNullException.ThrowIfNull(root);
        var terms = new List<SumTerm>();
        var coordinates = root.Coordinates;
        for (var i = 0; i < coordinates.Length; i++)
        {
            var c = coordinates[i];
            if (c == 0)
            {
                continue;
            }

            var alpha = new SubscriptNode(MathNodes.Symbol("alpha"), MathNodes.Integer(i + 1));
            terms.Add(new SumTerm(c < 0, MathNodes.Product(MathNodes.Integer(Math.Abs(c)), alpha)));
        }

        return MathNodes.Sum(terms);
    }
}
