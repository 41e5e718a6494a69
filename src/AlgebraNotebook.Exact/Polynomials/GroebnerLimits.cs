namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// Limits on a Groebner-basis computation. When one is exceeded the computation stops with a
/// <see cref="BeyondCapabilityException"/> naming the limit, instead of running for an unbounded time.
/// </summary>
/// <example><c>new GroebnerLimits { MaxPairsReduced = 200_000 }</c></example>
public sealed class GroebnerLimits
{
    /// <summary>The limits used when none are given: 500 polynomials, 20,000 reduced pairs, degree 100.</summary>
    public static GroebnerLimits Default { get; } = new();

    /// <summary>
    /// Largest number of polynomials the computation may hold (input relations plus every non-zero reduced S-polynomial,
    /// including those later found redundant). Default 500.
    /// </summary>
    public int MaxBasisSize { get; init; } = 500;

    /// <summary>Largest number of S-pairs that may be reduced (pairs skipped by the criteria do not count). Default 20,000.</summary>
    public int MaxPairsReduced { get; init; } = 20_000;

    /// <summary>Largest total degree of a newly produced basis polynomial. Default 100.</summary>
    public int MaxDegree { get; init; } = 100;

    /// <inheritdoc />
    public override string ToString() =>
        $"at most {MaxBasisSize} polynomials, {MaxPairsReduced} reduced S-pairs, total degree {MaxDegree}";

    internal void Validate()
    {
        if (MaxBasisSize < 1 || MaxPairsReduced < 0 || MaxDegree < 0)
        {
            throw new ExactArgumentException(
                $"Groebner limits must be positive (got {this}).", "limits");
        }
    }
}
