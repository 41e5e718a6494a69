namespace AlgebraNotebook.Display.Tree;

/// <summary>
/// The order term O(...) that closes a truncated series: O(t^3) stands for terms of total degree 3 and higher.
/// </summary>
/// <param name="Argument">The expression inside O( ).</param>
public sealed record BigONode(MathNode Argument) : MathNode
{
    /// <summary>The expression inside O( ).</summary>
    public MathNode Argument { get; } = Argument ?? throw new ArgumentNullException(nameof(Argument));

    /// <inheritdoc />
    public override bool IsTall => Argument.IsTall;
}
