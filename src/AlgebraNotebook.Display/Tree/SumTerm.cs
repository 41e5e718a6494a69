namespace AlgebraNotebook.Display.Tree;

/// <summary>One term of a <see cref="SumNode"/>: its sign and its magnitude.</summary>
/// <param name="Negative">True when the term is subtracted (shown with a minus sign).</param>
/// <param name="Magnitude">The term without its sign.</param>
public readonly record struct SumTerm(bool Negative, MathNode Magnitude);
