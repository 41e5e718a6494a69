namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// An explicit subscript (MathML <c>msub</c>, LaTeX <c>_{...}</c>, plain "a_k"). Symbol names get their subscripts
/// from <see cref="SymbolNames"/> instead; this node is for structure built in code, such as a basis element e_3.
/// </summary>
/// <param name="Base">The base.</param>
/// <param name="Index">The subscript.</param>
public sealed record SubscriptNode(MathNode Base, MathNode Index) : MathNode
{
    /// <summary>The base.</summary>
    public MathNode Base { get; } = Base ?? throw new ArgumentNullException(nameof(Base));

    /// <summary>The subscript.</summary>
    public MathNode Index { get; } = Index ?? throw new ArgumentNullException(nameof(Index));

    /// <inheritdoc />
    public override bool IsTall => Base.IsTall;
}
