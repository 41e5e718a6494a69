using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// Exact eigenvalues in Q and in Q(i). Method: characteristic polynomial det(λI - A) (Berkowitz), its square-free
/// part, denominators cleared to integer (Gaussian-integer) coefficients, the roots in the field found exactly, then
/// multiplicities by repeated division and eigenspaces as null spaces of A - λI.
/// </summary>
/// <remarks>
/// Two root finders, both verified exactly:
/// <list type="bullet">
/// <item><b>By lifting</b> (used by the eigenvalue methods): with f = a_d x^d + ... + a_0 the root y = a_d x of the monic
/// integer polynomial a_d^(d-1) f(y / a_d) lies in Z (Z[i]); its roots are found modulo the first prime p = 3 (mod 4)
/// below 400 for which they are distinct, lifted p-adically beyond Cauchy's root bound and checked. No factoring is
/// needed, so large coefficients are fine; a <see cref="BeyondCapabilityException"/> is thrown only if no such prime below 400 exists.</item>
/// <item><b>By divisors</b> (the rational root theorem, kept as the reference): candidates p/q with p dividing the constant
/// and q the leading coefficient (Gaussian divisors through the norm for Q(i)), within Cauchy's bound, then deflation.
/// The two coefficients (their norms for Q(i)) are factored by trial division up to 1,000,000 plus a deterministic
/// Miller-Rabin test (below 3.3e24) on a prime or prime-power cofactor; at most 2,000,000 divisor pairs are enumerated.
/// Beyond that a <see cref="BeyondCapabilityException"/> names the limit.</item>
/// </list>
/// </remarks>
public static class Eigenvalues
{
    /// <summary>
    /// The rational eigenvalues of a rational matrix, in increasing order. Eigenvalues outside Q (such as ±i or √2)
    /// stay in <see cref="EigenDecomposition{T}.RemainingFactor"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">No suitable prime below 400 exists for the lifting root finder (see remarks).</exception>
    public static EigenDecomposition<Rational> OverRationals(Matrix<Rational> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("find the eigenvalues of");
        return Decompose(matrix, FieldRoots.RationalRootsByLifting);
    }

    /// <summary>
    /// The Gaussian-rational eigenvalues a + b i of a Gaussian-rational matrix, ordered by real part, then by
    /// imaginary part. Eigenvalues outside Q(i) stay in <see cref="EigenDecomposition{T}.RemainingFactor"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">No suitable prime below 400 exists for the lifting root finder (see remarks).</exception>
    public static EigenDecomposition<GaussianRational> OverGaussianRationals(Matrix<GaussianRational> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("find the eigenvalues of");
        return Decompose(matrix, FieldRoots.GaussianRationalRootsByLifting);
    }

    /// <summary>
    /// The eigenvalues in Q(i) of a rational matrix, e.g. ±i for the rotation generator [[0, -1], [1, 0]].
    /// Same ordering as <see cref="OverGaussianRationals(Matrix{GaussianRational})"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">No suitable prime below 400 exists for the lifting root finder (see remarks).</exception>
    public static EigenDecomposition<GaussianRational> OverGaussianRationals(Matrix<Rational> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        return OverGaussianRationals(matrix.Map(r => (GaussianRational)r));
    }

    /// <summary>The distinct rational roots of a non-zero polynomial, in increasing order, by p-adic lifting (see remarks).</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    public static IReadOnlyList<Rational> RationalRoots(UnivariatePolynomial<Rational> polynomial)
    {
        CheckNonZero(polynomial);
        return FieldRoots.RationalRootsByLifting(polynomial);
    }

    /// <summary>The distinct rational roots of a non-zero polynomial, in increasing order, by the divisor method (see remarks).</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    /// <exception cref="BeyondCapabilityException">The coefficients are too large to factor within the documented limits.</exception>
    public static IReadOnlyList<Rational> RationalRootsByDivisors(UnivariatePolynomial<Rational> polynomial)
    {
        CheckNonZero(polynomial);
        return FieldRoots.RationalRootsByDivisors(polynomial);
    }

    /// <summary>The distinct Gaussian-rational roots of a non-zero polynomial, by real then imaginary part, by p-adic lifting.</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    public static IReadOnlyList<GaussianRational> GaussianRationalRoots(UnivariatePolynomial<GaussianRational> polynomial)
    {
        CheckNonZero(polynomial);
        return FieldRoots.GaussianRationalRootsByLifting(polynomial);
    }

    /// <summary>The distinct Gaussian-rational roots of a non-zero polynomial, by real then imaginary part, by the divisor method.</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    /// <exception cref="BeyondCapabilityException">The coefficients are too large to factor within the documented limits.</exception>
    public static IReadOnlyList<GaussianRational> GaussianRationalRootsByDivisors(UnivariatePolynomial<GaussianRational> polynomial)
    {
        CheckNonZero(polynomial);
        return FieldRoots.GaussianRationalRootsByDivisors(polynomial);
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
