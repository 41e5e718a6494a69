using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Matrices.MatrixTestSupport;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class DeterminantTests
{
    [Fact]
    public void Determinant_variants_agree_with_the_cofactor_expansion_oracle()
    {
        // Oracle: the cofactor expansion, i.e. the definition (common practice).
        var random = new Random(1234);
        for (var iteration = 0; iteration < 40 * Iterations; iteration++)
        {
            var n = random.Next(0, 7);
            var a = iteration % 5 == 0
                ? RandomMatrixOfRank(random, Math.Max(n, 1), Math.Max(n, 1), Math.Max(n - 1, 1))
                : RandomIntegerMatrix(random, n, n, 1 + iteration % 20);
            var expected = LinearAlgebra.DeterminantLaplace(a);
            Assert.True(expected == LinearAlgebra.DeterminantBareiss(a), $"Bareiss disagrees for {a}");
            Assert.True(expected == LinearAlgebra.DeterminantBerkowitz(a), $"Berkowitz disagrees for {a}");
            Assert.True(expected == LinearAlgebra.DeterminantByElimination(a), $"elimination disagrees for {a}");
            Assert.True(expected == LinearAlgebra.Determinant(a), $"dispatcher disagrees for {a}");
        }
    }

    [Fact]
    public void Determinant_variants_agree_on_gaussian_rational_matrices()
    {
        var random = new Random(99);
        for (var iteration = 0; iteration < 20 * Iterations; iteration++)
        {
            var n = random.Next(1, 6);
            var a = Matrix<GaussianRational>.FromFunction(
                n, n, (_, _) => new GaussianRational(new Rational(random.Next(-5, 6), random.Next(1, 4)), random.Next(-5, 6)));
            var expected = LinearAlgebra.DeterminantLaplace(a);
            Assert.True(expected == LinearAlgebra.DeterminantBareiss(a), $"Bareiss disagrees for {a}");
            Assert.True(expected == LinearAlgebra.DeterminantBerkowitz(a), $"Berkowitz disagrees for {a}");
            Assert.True(expected == LinearAlgebra.DeterminantByElimination(a), $"elimination disagrees for {a}");
            // det(A^†) = conj(det A): common practice.
            Assert.True(expected.Conjugate() == LinearAlgebra.Determinant(a.ConjugateTranspose()), $"det of adjoint fails for {a}");
        }
    }

    [Fact]
    public void Determinant_matches_MathNet_in_double_precision()
    {
        // Reference: MathNet.Numerics 5.0.0 LU determinant.
        var random = new Random(4242);
        for (var iteration = 0; iteration < 30 * Iterations; iteration++)
        {
            var n = random.Next(1, 9);
            var a = RandomIntegerMatrix(random, n, n, 9);
            var exact = LinearAlgebra.Determinant(a).ToDouble();
            var numeric = ToMathNet(a).Determinant();
            // Rounding error of LU is relative to Hadamard's bound prod ||row_i||, not to |det|.
            var hadamard = Enumerable.Range(0, n)
                .Select(i => Math.Sqrt(Enumerable.Range(0, n).Sum(j => Math.Pow(a[i, j].ToDouble(), 2))))
                .Aggregate(1.0, (p, r) => p * r);
            Assert.True(Math.Abs(exact - numeric) <= 1e-10 * hadamard, $"det {exact} vs MathNet {numeric} for {a}");
        }
    }

    [Fact]
    public void Berkowitz_determinant_works_over_a_polynomial_ring()
    {
        // det of the Vandermonde matrix in (λ, 1, 2) is (1 - λ)(2 - λ)(2 - 1): common practice.
        var x = UnivariatePolynomial<Rational>.Variable;
        var one = UnivariatePolynomial<Rational>.One;
        var two = UnivariatePolynomial<Rational>.FromInteger(2);
        var vandermonde = Matrix.FromRows([one, x, x * x], [one, one, one], [one, two, two * two]);
        var expected = (one - x) * (two - x) * (two - one);
        Assert.Equal(expected, LinearAlgebra.DeterminantBerkowitz(vandermonde));
        Assert.Equal(expected, LinearAlgebra.DeterminantLaplace(vandermonde));
        Assert.Equal(expected, LinearAlgebra.Determinant(vandermonde));
    }

    [Fact]
    public void Determinant_of_the_empty_matrix_is_one_and_of_a_singular_matrix_zero()
    {
        Assert.Equal(Rational.One, LinearAlgebra.Determinant(Matrix<Rational>.Zero(0, 0))); // common practice
        Assert.Equal(Rational.One, LinearAlgebra.DeterminantBareiss(Matrix<Rational>.Zero(0, 0)));
        Assert.Equal(Rational.One, LinearAlgebra.DeterminantBerkowitz(Matrix<Rational>.Zero(0, 0)));
        Assert.Equal(Rational.Zero, LinearAlgebra.Determinant(R("[[1, 2, 3, 4], [2, 4, 6, 8], [0, 1, 0, 1], [5, 5, 5, 5]]")));
    }

    [Fact]
    public void Determinant_of_a_non_square_matrix_names_the_shape()
    {
        var a = Matrix<Rational>.Zero(2, 3);
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => LinearAlgebra.Determinant(a)).Message);
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => LinearAlgebra.DeterminantBareiss(a)).Message);
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => LinearAlgebra.DeterminantBerkowitz(a)).Message);
        Assert.Throws<BeyondCapabilityException>(() => LinearAlgebra.DeterminantLaplace(Matrix<Rational>.Identity(10)));
    }
}
