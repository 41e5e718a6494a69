using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Display.Lie;

/// <summary>Display tree for <see cref="Weight"/>: its Dynkin labels in parentheses, "(1, 0, −2)".</summary>
public static class WeightDisplay
{
    /// <summary>The Dynkin labels between parentheses, separated by commas (the basis of fundamental weights is implied).</summary>
    public static MathNode ToTree(Weight weight)
    {
        var items = new List<MathNode>();
        var labels = weight.AsSpan();
        for (var i = 0; i < labels.Length; i++)
        {
            if (i > 0)
            {
                items.Add(MathNodes.Operator(","));
            }

            items.Add(MathNodes.Integer(labels[i]));
        }

        return MathNodes.Fenced(MathNodes.Row(items.ToArray()));
    }
}
