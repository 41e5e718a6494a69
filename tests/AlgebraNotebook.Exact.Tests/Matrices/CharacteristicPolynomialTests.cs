using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Matrices.MatrixTestSupport;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class CharacteristicPolynomialTests
{
    [Fact]
    public void Cayley_Hamilton_holds_for_random_matrices()
    {
        // Cayley-Hamilton theorem: p_A(A) = 0 (common practice).
        var random = new Random(5150);
        for (var iteration = 0; iteration < 25 * Iterations; iteration++)
        {
            var n = random.Next(1, 8);
            var a = RandomIntegerMatrix(random, n, n, 7);
            var p = LinearAlgebra.CharacteristicPolynomial(a);
            Assert.True(p.Evaluate(a).IsZero, $"p(A) != 0 for A = {a}, p = {p}");
        }
    }

    [Fact]
    public void Berkowitz_agrees_with_the_cofactor_expansion_of_lambda_I_minus_A()
    {
        // Oracle: det(λI - A) expanded by cofactors over the polynomial ring (the definition, common practice).
        var random = new Random(8086);
        for (var iteration = 0; iteration < 20 * Iterations; iteration++)
        {
            var n = random.Next(0, 6);
            var a = RandomIntegerMatrix(random, n, n, 9);
            var berkowitz = LinearAlgebra.CharacteristicPolynomialBerkowitz(a);
            Assert.True(berkowitz == LinearAlgebra.CharacteristicPolynomialLaplace(a), $"Berkowitz {berkowitz} disagrees for {a}");
            Assert.Equal(n, berkowitz.Degree);
            Assert.True(berkowitz.IsMonic);
            // Sign convention: coefficient of λ^(n-1) is -tr A, constant term (-1)^n det A (common practice).
            if (n > 0)
            {
                Assert.Equal(-a.Trace(), berkowitz.Coefficient(n - 1));
            }

            var sign = n % 2 == 0 ? Rational.One : Rational.MinusOne;
            Assert.Equal(sign * LinearAlgebra.Determinant(a), berkowitz.Coefficient(0));
        }
    }

    [Fact]
    public void Characteristic_polynomial_of_a_worked_example()
    {
        // [[2, 1], [1, 2]] has det(λI - A) = λ^2 - 4λ + 3 (worked by hand, common practice).
        var p = LinearAlgebra.CharacteristicPolynomial(R("[[2, 1], [1, 2]]"));
        Assert.Equal("λ^2 - 4*λ + 3", p.ToString());
        Assert.Equal("t^2 - 4*t + 3", p.ToString("t"));
        // The rotation generator: λ^2 + 1.
        Assert.Equal("λ^2 + 1", LinearAlgebra.CharacteristicPolynomial(R("[[0, -1], [1, 0]]")).ToString());
    }

    [Fact]
    public void Minimal_polynomial_divides_the_characteristic_polynomial_and_annihilates()
    {
        // Jordan block J_2(3) ⊕ [3]: minimal polynomial (λ - 3)^2, characteristic (λ - 3)^3 (common practice).
        var a = R("[[3, 1, 0], [0, 3, 0], [0, 0, 3]]");
        Assert.Equal(UnivariatePolynomial.FromRoots<Rational>(3, 3), LinearAlgebra.MinimalPolynomial(a));
        Assert.Equal(UnivariatePolynomial.FromRoots<Rational>(3, 3, 3), LinearAlgebra.CharacteristicPolynomial(a));
        Assert.Equal(UnivariatePolynomial.FromRoots<Rational>(5), LinearAlgebra.MinimalPolynomial(5 * Matrix<Rational>.Identity(4)));

        var random = new Random(1999);
        for (var iteration = 0; iteration < 15 * Iterations; iteration++)
        {
            var n = random.Next(1, 6);
            // Block structure makes repeated eigenvalues, so the minimal polynomial is often a proper divisor.
            var block = RandomIntegerMatrix(random, n, n, 3);
            var m = Matrix.DirectSum(block, block);
            var minimal = LinearAlgebra.MinimalPolynomial(m);
            Assert.True(minimal.Evaluate(m).IsZero, $"m(A) != 0 for {m}");
            Assert.True(UnivariatePolynomial.DivideWithRemainder(LinearAlgebra.CharacteristicPolynomial(m), minimal).Remainder.IsZero, $"m does not divide p for {m}");
            Assert.True(minimal == LinearAlgebra.MinimalPolynomial(block), $"minimal polynomial of A ⊕ A differs from that of A = {block}");
        }
    }

    [Fact]
    public void Characteristic_polynomial_of_a_non_square_matrix_names_the_shape()
    {
        Assert.Contains("3x2", Assert.Throws<ExactArgumentException>(() => LinearAlgebra.CharacteristicPolynomial(Matrix<Rational>.Zero(3, 2))).Message);
    }
}
