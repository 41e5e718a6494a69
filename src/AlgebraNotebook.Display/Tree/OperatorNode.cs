using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// An operator or separator inside a <see cref="RowNode"/>, given by its Unicode character: "=", ",", "⋅" (U+22C5),
/// "×", "⊗", "→", "−" (U+2212) and so on. LaTeX and plain text translate the common ones ("⋅" to <c>\cdot</c> and
/// "*"); others pass through unchanged. Signs of sums are not operators: they belong to <see cref="SumNode"/>.
/// </summary>
public sealed record OperatorNode : MathNode
{
    /// <summary>Creates the operator.</summary>
    /// <exception cref="ExactArgumentException">The text is empty.</exception>
    public OperatorNode(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text.Length == 0)
        {
            throw new ExactArgumentException("Operator text is empty.", nameof(text));
        }

        Text = text;
    }

    /// <summary>The operator as Unicode text.</summary>
    public string Text { get; }

    /// <inheritdoc />
    public override bool IsTall => false;
}
