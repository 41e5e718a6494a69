using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// A named quantity. With <see cref="IdentifierStyle.Symbol"/> the name is a symbol name such as <c>alpha</c>,
/// <c>J_x</c> or <c>t1</c> whose subscript (if any) is derived by <see cref="SymbolNames"/> in MathML and LaTeX;
/// plain text always shows <see cref="Name"/> verbatim, so it reads back as the same symbol.
/// </summary>
public sealed record IdentifierNode : MathNode
{
    /// <summary>Creates an identifier.</summary>
    /// <exception cref="ExactArgumentException">The name is empty.</exception>
    public IdentifierNode(string name, IdentifierStyle style = IdentifierStyle.Symbol)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (name.Length == 0)
        {
            throw new ExactArgumentException("Identifier name is empty.", nameof(name));
        }

        Name = name;
        Style = style;
    }

    /// <summary>The identifier's name as written in plain text.</summary>
    public string Name { get; }

    /// <summary>How the identifier is typeset.</summary>
    public IdentifierStyle Style { get; }

    /// <inheritdoc />
    public override bool IsTall => false;
}
