using System.Numerics;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class HilbertMatrixTests
{
    // OEIS A005249: 1/det(H_n), n = 1..8 (also re-derived from the Cauchy determinant product
    // det H_n = prod_{i<j} (j-i)^2 / prod_{i,j} (i+j-1), which agrees for all eight values).
    private static readonly string[] ReciprocalDeterminants =
    [
        "1", "12", "2160", "6048000", "266716800000", "186313420339200000", "2067909047925770649600000",
        "365356847125734485878112256000000",
    ];

    private static Matrix<Rational> Hilbert(int n) => Matrix<Rational>.FromFunction(n, n, (i, j) => new Rational(1, i + j + 1));

    private static BigInteger Binomial(int n, int k)
    {
        if (k < 0 || k > n)
        {
            return BigInteger.Zero;
        }

        var result = BigInteger.One;
        for (var t = 1; t <= k; t++)
        {
            result = result * (n - k + t) / t;
        }

        return result;
    }

    [Fact]
    public void Reciprocal_determinant_of_hilbert_matrix_matches_OEIS_A005249()
    {
        for (var n = 1; n <= 8; n++)
        {
            var expected = new Rational(1, BigInteger.Parse(ReciprocalDeterminants[n - 1])); // OEIS A005249
            var h = Hilbert(n);
            Assert.Equal(expected, LinearAlgebra.Determinant(h));
            Assert.Equal(expected, LinearAlgebra.DeterminantByElimination(h));
            Assert.Equal(expected, LinearAlgebra.DeterminantBareiss(h));
            Assert.Equal(expected, LinearAlgebra.DeterminantBerkowitz(h));
        }
    }

    [Fact]
    public void Determinant_of_hilbert_matrix_matches_the_cauchy_determinant_product()
    {
        for (var n = 1; n <= 12; n++)
        {
            // Cauchy's determinant with x_i = i, y_j = j - 1 (common practice).
            var numerator = BigInteger.One;
            var denominator = BigInteger.One;
            for (var i = 1; i <= n; i++)
            {
                for (var j = 1; j <= n; j++)
                {
                    denominator *= i + j - 1;
                    if (j > i)
                    {
                        numerator *= (j - i) * (j - i);
                    }
                }
            }

            Assert.Equal(new Rational(numerator, denominator), LinearAlgebra.DeterminantBareiss(Hilbert(n)));
        }
    }

    [Fact]
    public void Inverse_of_hilbert_matrix_matches_the_closed_form_of_Choi()
    {
        // M.-D. Choi, "Tricks or treats with the Hilbert matrix", Amer. Math. Monthly 90 (1983) 301-312:
        // (H_n^-1)_ij = (-1)^(i+j) (i+j-1) C(n+i-1, n-j) C(n+j-1, n-i) C(i+j-2, i-1)^2, indices from 1.
        for (var n = 1; n <= 10; n++)
        {
            var inverse = LinearAlgebra.Inverse(Hilbert(n));
            for (var i = 1; i <= n; i++)
            {
                for (var j = 1; j <= n; j++)
                {
                    var c = Binomial(i + j - 2, i - 1);
                    var expected = (i + j - 1) * Binomial(n + i - 1, n - j) * Binomial(n + j - 1, n - i) * c * c;
                    if (((i + j) & 1) == 1)
                    {
                        expected = -expected;
                    }

                    Assert.True(inverse[i - 1, j - 1].IsInteger, $"H_{n}^-1 entry ({i}, {j}) = {inverse[i - 1, j - 1]} is not an integer");
                    Assert.Equal(new Rational(expected), inverse[i - 1, j - 1]);
                }
            }

            Assert.Equal(Matrix<Rational>.Identity(n), inverse * Hilbert(n));
        }
    }
}
