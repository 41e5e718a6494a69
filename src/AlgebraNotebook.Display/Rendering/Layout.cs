using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display.Rendering;

/// <summary>Layout decisions shared by the renderers, so the three outputs agree.</summary>
internal static class Layout
{
    /// <summary>
    /// True when a product needs a visible multiplication dot before <paramref name="factor"/>: when the factor
    /// starts with a number or a fraction, juxtaposition would read as one number (2 3) or a mixed number (2 ½).
    /// </summary>
    public static bool NeedsVisibleDotBefore(MathNode factor)
    {
        var leading = factor;
        while (true)
        {
            switch (leading)
            {
                case PowerNode power:
                    leading = power.Base;
                    break;
                case SubscriptNode subscript:
                    leading = subscript.Base;
                    break;
                case ProductNode product:
                    leading = product.Factors[0];
                    break;
                case SumNode sum when !sum.Terms[0].Negative:
                    leading = sum.Terms[0].Magnitude;
                    break;
                case RowNode { Items.Count: > 0 } row:
                    leading = row.Items[0];
                    break;
                default:
                    return leading is NumberNode or FractionNode;
            }
        }
    }

    /// <summary>Opening and closing delimiter characters.</summary>
    public static (string Open, string Close) Delimiters(FenceKind kind) => kind switch
    {
        FenceKind.Parentheses => ("(", ")"),
        FenceKind.Brackets => ("[", "]"),
        FenceKind.Braces => ("{", "}"),
        FenceKind.Bars => ("|", "|"),
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown fence kind."),
    };
}
