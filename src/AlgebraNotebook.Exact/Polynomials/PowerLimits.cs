namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// Limits on raising a polynomial to a power (the degree and term limits apply to several terms, the coefficient limit
/// to every polynomial). The result's size is estimated before any work; an
/// estimate beyond a limit stops the computation with a <see cref="BeyondCapabilityException"/> that states the estimate,
/// instead of running for an unbounded time.
/// </summary>
/// <example><c>p.Pow(5000, new PowerLimits { MaxTotalDegree = 50_000 })</c></example>
public sealed class PowerLimits
{
    /// <summary>The limits used when none are given: total degree 10,000, 1,000,000 terms and coefficients of 65,536 bits.</summary>
    public static PowerLimits Default { get; } = new();

    /// <summary>Largest total degree of the result. Default 10,000.</summary>
    public long MaxTotalDegree { get; init; } = 10_000;

    /// <summary>Largest estimated number of terms of the result (an upper bound, see <see cref="Polynomial{T}.Pow(int, PowerLimits)"/>). Default 1,000,000.</summary>
    public long MaxTerms { get; init; } = 1_000_000;

    /// <summary>
    /// Largest estimated size in bits of a coefficient of the result, numerator and denominator together (the estimate is
    /// described at <see cref="Polynomial{T}.Pow(int, PowerLimits)"/>). Default 65,536, the same cap as powers written in
    /// polynomial text: printing a number takes time quadratic in its length.
    /// </summary>
    public long MaxCoefficientBits { get; init; } = 1 << 16;

    /// <inheritdoc />
    public override string ToString() => $"total degree at most {MaxTotalDegree}, at most {MaxTerms} terms, coefficients of at most {MaxCoefficientBits} bits";

    internal void Validate()
    {
        if (MaxTotalDegree < 0 || MaxTerms < 1 || MaxCoefficientBits < 1)
        {
            throw new ExactArgumentException($"Power limits must be positive (got {this}).", "limits");
        }
    }
}
