using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// Exact eigenvalues in Q and in Q(i). Method: characteristic polynomial det(λI - A) (Berkowitz), its square-free
/// part, denominators cleared to integer (Gaussian-integer) coefficients, candidates p/q from the rational root
/// theorem within Cauchy's root bound, exact verification, deflation; then multiplicities by repeated division and
/// eigenspaces as null spaces of A - λI.
/// </summary>
/// <remarks>
/// Limits: the constant and leading coefficients (for Q(i): their norms) are factored by trial division up to
/// 1,000,000 and a deterministic Miller-Rabin test on the cofactor below 3.3e24; at most 2,000,000 divisor pairs are
/// enumerated. Beyond that a <see cref="BeyondCapabilityException"/> names the limit.
/// </remarks>
public static class Eigenvalues
{
    /// <summary>
    /// The rational eigenvalues of a rational matrix, in increasing order. Eigenvalues outside Q (such as ±i or √2)
    /// stay in <see cref="EigenDecomposition{T}.RemainingFactor"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">The integers met are too large to factor within the documented limits.</exception>
    public static EigenDecomposition<Rational> OverRationals(Matrix<Rational> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("find the eigenvalues of");
        return Decompose(matrix, FieldRoots.RationalRoots);
    }

    /// <summary>
    /// The Gaussian-rational eigenvalues a + b i of a Gaussian-rational matrix, ordered by real part, then by
    /// imaginary part. Eigenvalues outside Q(i) stay in <see cref="EigenDecomposition{T}.RemainingFactor"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">The integers met are too large to factor within the documented limits.</exception>
    public static EigenDecomposition<GaussianRational> OverGaussianRationals(Matrix<GaussianRational> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("find the eigenvalues of");
        return Decompose(matrix, FieldRoots.GaussianRationalRoots);
    }

    /// <summary>
    /// The eigenvalues in Q(i) of a rational matrix, e.g. ±i for the rotation generator [[0, -1], [1, 0]].
    /// Same ordering as <see cref="OverGaussianRationals(Matrix{GaussianRational})"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">The integers met are too large to factor within the documented limits.</exception>
    public static EigenDecomposition<GaussianRational> OverGaussianRationals(Matrix<Rational> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        return OverGaussianRationals(matrix.Map(r => (GaussianRational)r));
    }

    /// <summary>The distinct rational roots of a non-zero polynomial, in increasing order (same method and limits).</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    public static IReadOnlyList<Rational> RationalRoots(UnivariatePolynomial<Rational> polynomial)
    {
        CheckNonZero(polynomial);
        return FieldRoots.RationalRoots(polynomial);
    }

    /// <summary>The distinct Gaussian-rational roots of a non-zero polynomial, by real then imaginary part.</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    public static IReadOnlyList<GaussianRational> GaussianRationalRoots(UnivariatePolynomial<GaussianRational> polynomial)
    {
        CheckNonZero(polynomial);
        return FieldRoots.GaussianRationalRoots(polynomial);
    }

    private static void CheckNonZero<T>(UnivariatePolynomial<T> polynomial)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(polynomial);
        if (polynomial.IsZero)
        {
            throw new ExactArgumentException("Every value is a root of the zero polynomial; ask for the roots of a non-zero polynomial.", nameof(polynomial));
        }
    }

    private static EigenDecomposition<T> Decompose<T>(Matrix<T> matrix, Func<UnivariatePolynomial<T>, List<T>> roots)
        where T : IFieldElement<T>
    {
        var characteristic = LinearAlgebra.CharacteristicPolynomial(matrix);
        var remaining = characteristic;
        var eigenvalues = new List<Eigenvalue<T>>();
        var n = matrix.RowCount;
        foreach (var value in roots(characteristic))
        {
            var (multiplicity, cofactor) = UnivariatePolynomial.RootMultiplicity(remaining, value);
            remaining = cofactor;
            var shifted = Matrix<T>.Create(n, n, (i, j) => i == j ? matrix.At(i, j) - value : matrix.At(i, j));
            eigenvalues.Add(new Eigenvalue<T>(value, multiplicity, LinearAlgebra.NullSpace(shifted)));
        }

        return new EigenDecomposition<T>(matrix, characteristic, eigenvalues, UnivariatePolynomial.Monic(remaining));
    }
}
