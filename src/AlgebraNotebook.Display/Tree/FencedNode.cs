namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// Content between delimiters. <see cref="Stretchy"/> decides whether the delimiters grow with tall content (MathML
/// <c>stretchy</c>, LaTeX <c>\left( ... \right)</c>); MathML always states it explicitly so that a fraction next to
/// non-stretchy brackets cannot make them grow.
/// </summary>
/// <param name="Content">The enclosed expression.</param>
/// <param name="Kind">The delimiters.</param>
/// <param name="Stretchy">Whether the delimiters stretch to the content.</param>
public sealed record FencedNode(MathNode Content, FenceKind Kind, bool Stretchy) : MathNode
{
    /// <summary>The enclosed expression.</summary>
    public MathNode Content { get; } = Content ?? throw new ArgumentNullException(nameof(Content));

    /// <inheritdoc />
    public override bool IsTall => Content.IsTall;
}
