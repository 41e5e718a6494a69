namespace AlgebraNotebook.Algebras;

/// <summary>
/// The signature of a real symmetric bilinear form (Sylvester's law of inertia): the numbers of positive, negative and
/// zero squares in any diagonal form.
/// </summary>
/// <param name="Positive">Number of positive squares.</param>
/// <param name="Negative">Number of negative squares.</param>
/// <param name="Zero">Dimension of the kernel (radical) of the form.</param>
public readonly record struct FormSignature(int Positive, int Negative, int Zero)
{
    /// <summary>The dimension of the space.</summary>
    public int Dimension => Positive + Negative + Zero;

    /// <summary>True when the form is non-degenerate.</summary>
    public bool IsNonDegenerate => Zero == 0;

    /// <summary>True when the form is positive definite.</summary>
    public bool IsPositiveDefinite => Negative == 0 && Zero == 0;

    /// <summary>True when the form is negative definite.</summary>
    public bool IsNegativeDefinite => Positive == 0 && Zero == 0;

    /// <summary>Plain text "(positive, negative, zero)", e.g. "(2, 1, 0)".</summary>
    public override string ToString() => $"({Positive}, {Negative}, {Zero})";
}
