using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

public static partial class LinearAlgebra
{
    /// <summary>
    /// The characteristic polynomial with the sign convention det(λI - A): monic of degree n, the coefficient of
    /// λ^(n-1) is -trace(A) and the constant coefficient is (-1)^n det(A). Computed division-free
    /// (<see cref="CharacteristicPolynomialBerkowitz{T}"/>), so any commutative ring of scalars works.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public static UnivariatePolynomial<T> CharacteristicPolynomial<T>(Matrix<T> matrix)
        where T : IRingElement<T> => CharacteristicPolynomialBerkowitz(matrix);

    /// <summary>
    /// det(λI - A) by Berkowitz's division-free algorithm, O(n^4) ring operations (convention as in
    /// <see cref="CharacteristicPolynomial{T}"/>).
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public static UnivariatePolynomial<T> CharacteristicPolynomialBerkowitz<T>(Matrix<T> matrix)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("take the characteristic polynomial of");
        var highestFirst = BerkowitzCore(matrix);
        Array.Reverse(highestFirst);
        return UnivariatePolynomial<T>.FromOwned(highestFirst);
    }

    /// <summary>
    /// det(λI - A) by cofactor expansion of the matrix λI - A over the polynomial ring: the plain definition, kept as
    /// the reference oracle. Limited to n &lt;= <see cref="LaplaceMaximumSize"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">The matrix is larger than <see cref="LaplaceMaximumSize"/>.</exception>
    public static UnivariatePolynomial<T> CharacteristicPolynomialLaplace<T>(Matrix<T> matrix)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("take the characteristic polynomial of");
        var shifted = Matrix<UnivariatePolynomial<T>>.Create(
            matrix.RowCount,
            matrix.ColumnCount,
            (i, j) => i == j
                ? UnivariatePolynomial<T>.FromCoefficients(-matrix.At(i, j), T.One)
                : UnivariatePolynomial<T>.Constant(-matrix.At(i, j)));
        return DeterminantLaplace(shifted);
    }

    /// <summary>
    /// The minimal polynomial: the monic polynomial m of least degree with m(A) = 0. Found as the first linear
    /// dependence among I, A, A^2, ... (flattened row by row), so its degree is at most n and it divides the
    /// characteristic polynomial. The 0x0 matrix has minimal polynomial 1.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public static UnivariatePolynomial<T> MinimalPolynomial<T>(Matrix<T> matrix)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("take the minimal polynomial of");
        var n = matrix.RowCount;
        if (n == 0)
        {
            return UnivariatePolynomial<T>.One;
        }

        var powers = new List<Matrix<T>> { Matrix<T>.Identity(n) };
        for (var degree = 1; degree <= n; degree++)
        {
            powers.Add(Matrix<T>.MultiplyCore(powers[^1], matrix));
            var stacked = Matrix<T>.Create(n * n, powers.Count, (k, j) => powers[j].At(k / n, k % n));
            var relations = NullSpace(stacked);
            if (relations.Count > 0)
            {
                // The earlier powers are independent, so the relation is unique up to scale and involves A^degree.
                var relation = relations[0];
                var coefficients = Enumerable.Range(0, powers.Count).Select(j => relation.At(j, 0)).ToArray();
                return UnivariatePolynomial.Monic(UnivariatePolynomial<T>.FromOwned(coefficients));
            }
        }

        throw new InvalidOperationException($"No polynomial relation of degree at most {n} was found for a {matrix.Shape} matrix, contradicting Cayley-Hamilton.");
    }
}
