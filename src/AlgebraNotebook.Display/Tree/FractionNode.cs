namespace AlgebraNotebook.Display.Tree;

/// <summary>A built-up fraction (MathML <c>mfrac</c>, LaTeX <c>\frac</c>, plain "a/b" with parentheses where needed).</summary>
/// <param name="Numerator">The numerator.</param>
/// <param name="Denominator">The denominator.</param>
public sealed record FractionNode(MathNode Numerator, MathNode Denominator) : MathNode
{
    /// <summary>The numerator.</summary>
    public MathNode Numerator { get; } = Numerator ?? throw new ArgumentNullException(nameof(Numerator));

    /// <summary>The denominator.</summary>
    public MathNode Denominator { get; } = Denominator ?? throw new ArgumentNullException(nameof(Denominator));

    /// <inheritdoc />
    public override bool IsTall => true;
}
