using System.Text;
using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display.Rendering;

/// <summary>
/// Writes a display tree as one line of plain text that reads like a formula in a paper and like the ToString of
/// the exact types: "x^2*y - 2*hbar", "1/2 - 3/5*i", "[[1, 1/2], [0, -3/4]]", "1 + t + 1/2*t^2 + O(t^3)".
/// Symbol names are kept verbatim. Parentheses are added where the linear notation needs them (a/(b*c), x^(n+1)).
/// Cost is linear in the size of the tree.
/// </summary>
internal sealed class PlainTextRenderer
{
    private static readonly Dictionary<string, string> Operators = new(StringComparer.Ordinal)
    {
        ["\u2212"] = " - ",
        ["+"] = " + ",
        ["-"] = " - ",
        ["="] = " = ",
        [","] = ", ",
        ["\u22C5"] = "*",
        ["×"] = " x ",
        ["→"] = " -> ",
        ["↦"] = " |-> ",
        ["≤"] = " <= ",
        ["≥"] = " >= ",
        ["≠"] = " != ",
        ["<"] = " < ",
        [">"] = " > ",
        ["⊗"] = " ⊗ ",
        ["⊕"] = " ⊕ ",
        ["∈"] = " in ",
        ["…"] = "...",
        ["⋯"] = "...",
        ["∂"] = "d",
        ["′"] = "'",
    };

    private readonly StringBuilder _out = new();

    public static string Render(MathNode node)
    {
        var renderer = new PlainTextRenderer();
        renderer.Write(node);
        return renderer._out.ToString();
    }

    private void Write(MathNode node)
    {
        switch (node)
        {
            case NumberNode number:
                _out.Append(number.Value.ToString());
                break;
            case IdentifierNode identifier:
                _out.Append(identifier.Name);
                break;
            case OperatorNode op:
                _out.Append(Operators.TryGetValue(op.Text, out var text) ? text : op.Text);
                break;
            case FractionNode fraction:
                WriteGrouped(fraction.Numerator, fraction.Numerator is SumNode || IsCompoundRow(fraction.Numerator));
                _out.Append('/');
                WriteGrouped(fraction.Denominator, fraction.Denominator is SumNode or ProductNode or FractionNode || IsCompoundRow(fraction.Denominator));
                break;
            case PowerNode power:
                WriteGrouped(power.Base, !IsAtom(power.Base));
                _out.Append('^');
                WriteGrouped(power.Exponent, power.Exponent is not (NumberNode or IdentifierNode));
                break;
            case SubscriptNode subscript:
                WriteGrouped(subscript.Base, !IsAtom(subscript.Base));
                _out.Append('_');
                WriteGrouped(subscript.Index, subscript.Index is not (NumberNode or IdentifierNode));
                break;
            case SumNode sum:
                for (var k = 0; k < sum.Terms.Count; k++)
                {
                    var term = sum.Terms[k];
                    if (k > 0)
                    {
                        _out.Append(term.Negative ? " - " : " + ");
                    }
                    else if (term.Negative)
                    {
                        _out.Append('-');
                    }

                    Write(term.Magnitude);
                }

                break;
            case ProductNode product:
                for (var k = 0; k < product.Factors.Count; k++)
                {
                    if (k > 0)
                    {
                        _out.Append('*');
                    }

                    // No grouping is needed for fractions: "x*1/2*y" read left to right has the same value.
                    Write(product.Factors[k]);
                }

                break;
            case FencedNode fenced:
                {
                    var (open, close) = Layout.Delimiters(fenced.Kind);
                    _out.Append(open);
                    Write(fenced.Content);
                    _out.Append(close);
                    break;
                }

            case MatrixNode matrix:
                _out.Append('[');
                for (var r = 0; r < matrix.Rows.Count; r++)
                {
                    _out.Append(r > 0 ? ", [" : "[");
                    var row = matrix.Rows[r];
                    for (var c = 0; c < row.Count; c++)
                    {
                        if (c > 0)
                        {
                            _out.Append(", ");
                        }

                        Write(row[c]);
                    }

                    _out.Append(']');
                }

                _out.Append(']');
                break;
            case RowNode row:
                foreach (var item in row.Items)
                {
                    Write(item);
                }

                break;
            case TextNode textNode:
                _out.Append(textNode.Text);
                break;
            case OverlineNode overline:
                // A row such as 351′ needs no parentheses: "351'bar" is the spelling of representation names.
                WriteGrouped(overline.Content, overline.Content is SumNode or ProductNode or FractionNode or PowerNode);
                _out.Append("bar");
                break;
            case BigONode bigO:
                _out.Append("O(");
                Write(bigO.Argument);
                _out.Append(')');
                break;
            default:
                throw new ArgumentException($"The plain-text writer does not know the node type {node.GetType().Name}.", nameof(node));
        }
    }

    private static bool IsAtom(MathNode node) =>
        node is NumberNode or IdentifierNode or FencedNode or MatrixNode or BigONode or TextNode or SubscriptNode or OverlineNode
        || node is OperatorNode { Text: "∂" };

    private static bool IsCompoundRow(MathNode node) => node is RowNode { Items.Count: > 1 };

    private void WriteGrouped(MathNode node, bool parenthesise)
    {
        if (parenthesise)
        {
            _out.Append('(');
            Write(node);
            _out.Append(')');
        }
        else
        {
            Write(node);
        }
    }
}
