using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Display.Lie;

/// <summary>Display trees for <see cref="SimpleCartanType"/> and <see cref="CartanType"/>: "E₈", "B₂ + A₁".</summary>
public static class CartanTypeDisplay
{
    /// <summary>The upright family letter with the rank as subscript, e.g. E₈.</summary>
    public static MathNode ToTree(SimpleCartanType type)
    {
        ArgumentNullException.ThrowIfNull(type);
        return new SubscriptNode(MathNodes.Upright(type.Family.ToString()), MathNodes.Integer(type.Rank));
    }

    /// <summary>The components joined by "+", in the order given, e.g. B₂ + A₁.</summary>
    public static MathNode ToTree(CartanType type)
    {
        ArgumentNullException.ThrowIfNull(type);
        var items = new List<MathNode>();
        foreach (var component in type.Components)
        {
            if (items.Count > 0)
            {
                items.Add(MathNodes.Operator("+"));
            }

            items.Add(ToTree(component));
        }

        return MathNodes.Row(items.ToArray());
    }
}
