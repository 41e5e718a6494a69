using AlgebraNotebook.Display.Rendering;

namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// A node of the display tree: a small, renderer-neutral description of a typeset formula. MathML, LaTeX and plain
/// text are produced from the same tree (see <see cref="MathDisplay"/>), so a converter is written once per
/// mathematical type and every output format follows.
/// </summary>
/// <remarks>
/// Nodes are immutable records. Build them with the smart constructors in <see cref="MathNodes"/>, which insert the
/// parentheses and sign handling that the renderers rely on (a <see cref="SumNode"/> never appears unparenthesised
/// inside a <see cref="ProductNode"/>, a negative factor is pulled out of a product, and so on). Numbers are
/// non-negative; a sign is always carried by the parent <see cref="SumNode"/>.
/// </remarks>
public abstract record MathNode
{
    private protected MathNode()
    {
    }

    /// <summary>
    /// True when the node is typeset taller than a line of text (it contains a fraction or a matrix); fences around
    /// tall content stretch, fences around short content are marked non-stretchy.
    /// </summary>
    public abstract bool IsTall { get; }

    /// <summary>The plain-text rendering of this tree (the same as <see cref="MathDisplay.ToPlainText"/>).</summary>
    public sealed override string ToString() => PlainTextRenderer.Render(this);
}
