using System.Text;
using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display.Rendering;

/// <summary>
/// Writes a display tree as Presentation MathML (the MathML Core subset that browsers render natively). Every node
/// becomes exactly one element, so it can be a child of <c>mfrac</c>, <c>msup</c> or <c>msub</c> without extra rows.
/// Cost is linear in the size of the tree.
/// </summary>
internal sealed class MathMLRenderer
{
    public const string Namespace = "http://www.w3.org/1998/Math/MathML";

    private readonly StringBuilder _out = new();

    public static string Render(MathNode node, string? style = null)
    {
        var renderer = new MathMLRenderer();
        renderer._out.Append("<math display=\"block\" xmlns=\"").Append(Namespace).Append('"');
        if (style is not null)
        {
            renderer._out.Append(" style=\"");
            XmlText.Append(renderer._out, style);
            renderer._out.Append('"');
        }

        renderer._out.Append('>');
        renderer.Write(node);
        renderer._out.Append("</math>");
        return renderer._out.ToString();
    }

    private void Write(MathNode node)
    {
        switch (node)
        {
            case NumberNode number:
                _out.Append("<mn>").Append(number.Value.ToString()).Append("</mn>");
                break;
            case IdentifierNode identifier when identifier.Style == IdentifierStyle.Upright:
                WriteIdentifierElement(identifier.Name, upright: identifier.Name.Length == 1);
                break;
            case IdentifierNode identifier:
                WriteSymbolName(identifier.Name);
                break;
            case OperatorNode op:
                WriteOperator(op.Text);
                break;
            case FractionNode fraction:
                _out.Append("<mfrac>");
                Write(fraction.Numerator);
                Write(fraction.Denominator);
                _out.Append("</mfrac>");
                break;
            case PowerNode { Base: SubscriptNode subscripted } power:
                // Superscript stacked over the subscript, as TeX sets x_1^2.
                _out.Append("<msubsup>");
                Write(subscripted.Base);
                Write(subscripted.Index);
                Write(power.Exponent);
                _out.Append("</msubsup>");
                break;
            case PowerNode { Base: IdentifierNode { Style: IdentifierStyle.Symbol } identifier } power
                when SymbolNames.Split(identifier.Name).Subscript is not null:
                WriteSymbolName(identifier.Name, power.Exponent);
                break;
            case PowerNode power:
                _out.Append("<msup>");
                Write(power.Base);
                Write(power.Exponent);
                _out.Append("</msup>");
                break;
            case SubscriptNode subscript:
                _out.Append("<msub>");
                Write(subscript.Base);
                Write(subscript.Index);
                _out.Append("</msub>");
                break;
            case SumNode sum:
                _out.Append("<mrow>");
                for (var k = 0; k < sum.Terms.Count; k++)
                {
                    var term = sum.Terms[k];
                    if (term.Negative)
                    {
                        WriteOperator("\u2212");
                    }
                    else if (k > 0)
                    {
                        WriteOperator("+");
                    }

                    Write(term.Magnitude);
                }

                _out.Append("</mrow>");
                break;
            case ProductNode product:
                _out.Append("<mrow>");
                for (var k = 0; k < product.Factors.Count; k++)
                {
                    if (k > 0)
                    {
                        // U+2062 INVISIBLE TIMES keeps juxtaposition meaningful for assistive technology.
                        _out.Append(Layout.NeedsVisibleDotBefore(product.Factors[k]) ? "<mo>\u22C5</mo>" : "<mo>&#x2062;</mo>");
                    }

                    Write(product.Factors[k]);
                }

                _out.Append("</mrow>");
                break;
            case FencedNode fenced:
                WriteFenced(fenced.Kind, fenced.Stretchy, () => Write(fenced.Content));
                break;
            case MatrixNode matrix:
                WriteFenced(matrix.Brackets, stretchy: true, () => WriteTable(matrix));
                break;
            case RowNode row:
                _out.Append("<mrow>");
                foreach (var item in row.Items)
                {
                    Write(item);
                }

                _out.Append("</mrow>");
                break;
            case TextNode text:
                _out.Append("<mtext>");
                XmlText.Append(_out, text.Text);
                _out.Append("</mtext>");
                break;
            case OverlineNode overline:
                _out.Append("<mover accent=\"true\">");
                Write(overline.Content);
                _out.Append("<mo stretchy=\"true\">&#x203E;</mo></mover>");
                break;
            case BigONode bigO:
                _out.Append("<mrow>");
                WriteIdentifierElement("O", upright: false);
                _out.Append("<mo>&#x2061;</mo>");
                WriteFenced(FenceKind.Parentheses, bigO.Argument.IsTall, () => Write(bigO.Argument));
                _out.Append("</mrow>");
                break;
            default:
                throw new ArgumentException($"The MathML writer does not know the node type {node.GetType().Name}.", nameof(node));
        }
    }

    private void WriteTable(MatrixNode matrix)
    {
        _out.Append("<mtable>");
        foreach (var row in matrix.Rows)
        {
            _out.Append("<mtr>");
            foreach (var entry in row)
            {
                _out.Append("<mtd>");
                Write(entry);
                _out.Append("</mtd>");
            }

            _out.Append("</mtr>");
        }

        _out.Append("</mtable>");
    }

    private void WriteFenced(FenceKind kind, bool stretchy, Action writeContent)
    {
        var (open, close) = Layout.Delimiters(kind);
        var attribute = stretchy ? "true" : "false";
        _out.Append("<mrow><mo stretchy=\"").Append(attribute).Append("\">");
        XmlText.Append(_out, open);
        _out.Append("</mo>");
        writeContent();
        _out.Append("<mo stretchy=\"").Append(attribute).Append("\">");
        XmlText.Append(_out, close);
        _out.Append("</mo></mrow>");
    }

    private void WriteOperator(string text)
    {
        _out.Append("<mo>");
        XmlText.Append(_out, text);
        _out.Append("</mo>");
    }

    /// <summary>Writes a symbol name by the <see cref="SymbolNames"/> convention, with an optional superscript stacked over its subscript.</summary>
    private void WriteSymbolName(string name, MathNode? superscript = null)
    {
        var (baseName, subscript) = SymbolNames.Split(name);
        if (subscript is null)
        {
            WriteSymbolBase(baseName);
            return;
        }

        _out.Append(superscript is null ? "<msub>" : "<msubsup>");
        WriteSymbolBase(baseName);
        if (subscript.All(char.IsAsciiDigit))
        {
            _out.Append("<mn>").Append(subscript).Append("</mn>");
        }
        else
        {
            WriteSymbolName(subscript);
        }

        if (superscript is null)
        {
            _out.Append("</msub>");
        }
        else
        {
            Write(superscript);
            _out.Append("</msubsup>");
        }
    }

    private void WriteSymbolBase(string baseName)
    {
        if (SymbolNames.TryGetGlyph(baseName, out var glyph, out _, out var upright))
        {
            WriteIdentifierElement(glyph, upright);
        }
        else
        {
            WriteIdentifierElement(baseName, upright: false);
        }
    }

    private void WriteIdentifierElement(string text, bool upright)
    {
        _out.Append(upright ? "<mi mathvariant=\"normal\">" : "<mi>");
        XmlText.Append(_out, text);
        _out.Append("</mi>");
    }
}
