namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// A bar over its content, as in the name of a conjugate representation: MathML <c>mover</c> with an accent overline,
/// LaTeX <c>\overline{...}</c>, plain text the content followed by "bar" (so "10bar", the spelling of names).
/// </summary>
/// <param name="Content">The content under the bar.</param>
public sealed record OverlineNode(MathNode Content) : MathNode
{
    /// <summary>The content under the bar.</summary>
    public MathNode Content { get; } = Content ?? throw new ArgumentNullException(nameof(Content));

    /// <inheritdoc />
    public override bool IsTall => Content.IsTall;
}
