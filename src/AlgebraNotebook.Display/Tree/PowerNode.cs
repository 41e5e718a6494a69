namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// A superscript power (MathML <c>msup</c>, LaTeX <c>^{...}</c>, plain "x^2"). The base is shown as given: use
/// <see cref="MathNodes.Power(MathNode, MathNode)"/> to get parentheses around compound bases.
/// </summary>
/// <param name="Base">The base.</param>
/// <param name="Exponent">The exponent.</param>
public sealed record PowerNode(MathNode Base, MathNode Exponent) : MathNode
{
    /// <summary>The base.</summary>
    public MathNode Base { get; } = Base ?? throw new ArgumentNullException(nameof(Base));

    /// <summary>The exponent.</summary>
    public MathNode Exponent { get; } = Exponent ?? throw new ArgumentNullException(nameof(Exponent));

    /// <inheritdoc />
    public override bool IsTall => Base.IsTall;
}
