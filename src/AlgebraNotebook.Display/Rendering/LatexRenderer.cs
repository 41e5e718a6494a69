using System.Text;
using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display.Rendering;

/// <summary>
/// Writes a display tree as a LaTeX math-mode fragment (no surrounding dollars), using only commands of standard
/// LaTeX with amsmath (<c>\frac</c>, <c>\mathrm</c>, <c>\text</c>, <c>pmatrix</c>). Cost is linear in the size of the tree.
/// </summary>
internal sealed class LatexRenderer
{
    private static readonly Dictionary<string, string> Operators = new(StringComparer.Ordinal)
    {
        ["\u2212"] = " - ",
        ["+"] = " + ",
        ["="] = " = ",
        [","] = ", ",
        ["\u22C5"] = @"\cdot",
        ["×"] = @"\times",
        ["⊗"] = @"\otimes",
        ["⊕"] = @"\oplus",
        ["→"] = @"\to",
        ["↦"] = @"\mapsto",
        ["≤"] = @"\le",
        ["≥"] = @"\ge",
        ["≠"] = @"\ne",
        ["∈"] = @"\in",
        ["{"] = @"\{",
        ["}"] = @"\}",
        ["…"] = @"\dots",
        ["⋯"] = @"\cdots",
        ["∂"] = @"\partial",
        ["′"] = "'",
    };

    private readonly StringBuilder _out = new();

    public static string Render(MathNode node)
    {
        var renderer = new LatexRenderer();
        renderer.Write(node);
        return renderer._out.ToString();
    }

    private void Write(MathNode node)
    {
        switch (node)
        {
            case NumberNode number:
                Emit(number.Value.ToString());
                break;
            case IdentifierNode identifier when identifier.Style == IdentifierStyle.Upright:
                Emit(@"\mathrm{" + EscapeMath(identifier.Name) + "}");
                break;
            case IdentifierNode identifier:
                WriteSymbolName(identifier.Name);
                break;
            case OperatorNode op:
                Emit(Operators.TryGetValue(op.Text, out var latex) ? latex : EscapeMath(op.Text));
                break;
            case FractionNode fraction:
                Emit(@"\frac{");
                Write(fraction.Numerator);
                Emit("}{");
                Write(fraction.Denominator);
                Emit("}");
                break;
            case PowerNode power:
                WriteScriptBase(power.Base, braceWhen: power.Base is PowerNode);
                Emit("^{");
                Write(power.Exponent);
                Emit("}");
                break;
            case SubscriptNode subscript:
                WriteScriptBase(subscript.Base, braceWhen: subscript.Base is SubscriptNode or PowerNode
                    || (subscript.Base is IdentifierNode { Style: IdentifierStyle.Symbol } id && SymbolNames.Split(id.Name).Subscript is not null));
                Emit("_{");
                Write(subscript.Index);
                Emit("}");
                break;
            case SumNode sum:
                for (var k = 0; k < sum.Terms.Count; k++)
                {
                    var term = sum.Terms[k];
                    if (k > 0)
                    {
                        Emit(term.Negative ? " - " : " + ");
                    }
                    else if (term.Negative)
                    {
                        Emit("-");
                    }

                    Write(term.Magnitude);
                }

                break;
            case ProductNode product:
                for (var k = 0; k < product.Factors.Count; k++)
                {
                    if (k > 0)
                    {
                        Emit(Layout.NeedsVisibleDotBefore(product.Factors[k]) ? @" \cdot " : " ");
                    }

                    Write(product.Factors[k]);
                }

                break;
            case FencedNode fenced:
                WriteFenced(fenced.Kind, fenced.Stretchy, () => Write(fenced.Content));
                break;
            case MatrixNode matrix:
                WriteMatrix(matrix);
                break;
            case RowNode row:
                foreach (var item in row.Items)
                {
                    Write(item);
                }

                break;
            case TextNode text:
                Emit(@"\text{" + EscapeText(text.Text) + "}");
                break;
            case OverlineNode overline:
                Emit(@"\overline{");
                Write(overline.Content);
                Emit("}");
                break;
            case BigONode bigO:
                Emit("O");
                WriteFenced(FenceKind.Parentheses, bigO.Argument.IsTall, () => Write(bigO.Argument));
                break;
            default:
                throw new ArgumentException($"The LaTeX writer does not know the node type {node.GetType().Name}.", nameof(node));
        }
    }

    private void WriteScriptBase(MathNode node, bool braceWhen)
    {
        if (braceWhen)
        {
            Emit("{");
            Write(node);
            Emit("}");
        }
        else
        {
            Write(node);
        }
    }

    private void WriteMatrix(MatrixNode matrix)
    {
        var environment = matrix.Brackets switch
        {
            FenceKind.Parentheses => "pmatrix",
            FenceKind.Brackets => "bmatrix",
            FenceKind.Braces => "Bmatrix",
            FenceKind.Bars => "vmatrix",
            _ => throw new ArgumentOutOfRangeException(nameof(matrix), matrix.Brackets, "Unknown bracket kind."),
        };
        Emit(@"\begin{" + environment + "} ");
        for (var r = 0; r < matrix.Rows.Count; r++)
        {
            if (r > 0)
            {
                Emit(@" \\ ");
            }

            var row = matrix.Rows[r];
            for (var c = 0; c < row.Count; c++)
            {
                if (c > 0)
                {
                    Emit(" & ");
                }

                Write(row[c]);
            }
        }

        Emit(@" \end{" + environment + "}");
    }

    private void WriteFenced(FenceKind kind, bool stretchy, Action writeContent)
    {
        var (open, close) = kind switch
        {
            FenceKind.Braces => (@"\{", @"\}"),
            _ => Layout.Delimiters(kind),
        };
        Emit(stretchy ? @"\left" + open : open);
        writeContent();
        Emit(stretchy ? @"\right" + close : close);
    }

    private void WriteSymbolName(string name)
    {
        var (baseName, subscript) = SymbolNames.Split(name);
        WriteSymbolBase(baseName);
        if (subscript is null)
        {
            return;
        }

        Emit("_{");
        if (subscript.All(char.IsAsciiDigit))
        {
            Emit(subscript);
        }
        else
        {
            WriteSymbolName(subscript);
        }

        Emit("}");
    }

    private void WriteSymbolBase(string baseName)
    {
        if (SymbolNames.TryGetGlyph(baseName, out _, out var latex, out _))
        {
            Emit(latex);
        }
        else if (baseName.Length == 1 && char.IsAsciiLetter(baseName[0]))
        {
            Emit(baseName);
        }
        else
        {
            Emit(@"\mathrm{" + EscapeMath(baseName) + "}");
        }
    }

    /// <summary>Appends text, separating it from a preceding control word (\alpha x, not \alphax).</summary>
    private void Emit(string text)
    {
        if (text.Length > 0 && char.IsAsciiLetter(text[0]) && EndsWithControlWord())
        {
            _out.Append(' ');
        }

        _out.Append(text);
    }

    private bool EndsWithControlWord()
    {
        var k = _out.Length - 1;
        if (k < 0 || !char.IsAsciiLetter(_out[k]))
        {
            return false;
        }

        while (k >= 0 && char.IsAsciiLetter(_out[k]))
        {
            k--;
        }

        return k >= 0 && _out[k] == '\\';
    }

    /// <summary>Escapes the characters that are special in math mode (names, operators).</summary>
    internal static string EscapeMath(string text)
    {
        var output = new StringBuilder(text.Length + 8);
        foreach (var c in text)
        {
            switch (c)
            {
                case '\\':
                    output.Append(@"\backslash ");
                    break;
                case '{' or '}' or '$' or '&' or '#' or '_' or '%':
                    output.Append('\\').Append(c);
                    break;
                case '^':
                    output.Append(@"\wedge ");
                    break;
                case '~':
                    output.Append(@"\sim ");
                    break;
                default:
                    output.Append(c);
                    break;
            }
        }

        return output.ToString();
    }

    /// <summary>Escapes the characters that are special in LaTeX text (inside \text{...}).</summary>
    internal static string EscapeText(string text)
    {
        var output = new StringBuilder(text.Length + 8);
        foreach (var c in text)
        {
            switch (c)
            {
                case '\\':
                    output.Append(@"\textbackslash{}");
                    break;
                case '{' or '}' or '$' or '&' or '#' or '_' or '%':
                    output.Append('\\').Append(c);
                    break;
                case '^':
                    output.Append(@"\^{}");
                    break;
                case '~':
                    output.Append(@"\~{}");
                    break;
                case '<':
                    output.Append(@"\textless{}");
                    break;
                case '>':
                    output.Append(@"\textgreater{}");
                    break;
                default:
                    output.Append(c);
                    break;
            }
        }

        return output.ToString();
    }
}
