namespace AlgebraNotebook.Display.Tree;

/// <summary>How an <see cref="IdentifierNode"/> is typeset.</summary>
public enum IdentifierStyle
{
    /// <summary>
    /// A variable named by a symbol name; MathML and LaTeX apply the naming convention of <see cref="SymbolNames"/>
    /// (greek names become greek letters, <c>hbar</c> becomes ℏ, a trailing number or an underscore starts a subscript).
    /// Plain text shows the name unchanged.
    /// </summary>
    Symbol,

    /// <summary>
    /// An upright (roman) name, used for constants and operator names: the imaginary unit i, and names such as "tr".
    /// </summary>
    Upright,
}
