namespace AlgebraNotebook.Display.Tree;

/// <summary>Literal prose inside a formula (MathML <c>mtext</c>, LaTeX <c>\text{...}</c> with escaping).</summary>
/// <param name="Text">The text; any characters, escaped by each renderer.</param>
public sealed record TextNode(string Text) : MathNode
{
    /// <summary>The text.</summary>
    public string Text { get; } = Text ?? throw new ArgumentNullException(nameof(Text));

    /// <inheritdoc />
    public override bool IsTall => false;
}
