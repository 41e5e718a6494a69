using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class UnivariatePolynomialTests
{
    private static UnivariatePolynomial<Rational> P(params int[] coefficients) =>
        UnivariatePolynomial<Rational>.FromCoefficients(coefficients.Select(c => (Rational)c));

    [Fact]
    public void Printing_uses_descending_powers_and_signs()
    {
        Assert.Equal("λ^2 - 3*λ + 2", P(2, -3, 1).ToString());
        Assert.Equal("-x^3 + 1/2*x", UnivariatePolynomial<Rational>.FromCoefficients(0, new Rational(1, 2), 0, -1).ToString("x"));
        Assert.Equal("0", UnivariatePolynomial<Rational>.Zero.ToString());
        Assert.Equal("(1 + i)*λ - i", UnivariatePolynomial<GaussianRational>.FromCoefficients(-GaussianRational.I, new GaussianRational(1, 1)).ToString());
        Assert.Equal(-1, UnivariatePolynomial<Rational>.Zero.Degree);
        Assert.Equal(2, P(1, 0, 3, 0, 0).Degree);
    }

    [Fact]
    public void Division_with_remainder_reconstructs_the_dividend()
    {
        // a = q b + r with deg r < deg b (common practice).
        var random = new Random(404);
        for (var iteration = 0; iteration < 50; iteration++)
        {
            var a = P(Enumerable.Range(0, random.Next(0, 8)).Select(_ => random.Next(-9, 10)).ToArray());
            var b = P(Enumerable.Range(0, random.Next(1, 5)).Select(_ => random.Next(-9, 10)).Append(random.Next(1, 5)).ToArray());
            var (q, r) = UnivariatePolynomial.DivideWithRemainder(a, b);
            Assert.True(q * b + r == a, $"q b + r != a for a = {a}, b = {b}");
            Assert.True(r.Degree < b.Degree, $"deg r >= deg b for a = {a}, b = {b}");
        }

        Assert.Throws<DivideByZeroException>(() => UnivariatePolynomial.DivideWithRemainder(P(1, 2), UnivariatePolynomial<Rational>.Zero));
    }

    [Fact]
    public void Gcd_and_square_free_part_of_products_of_linear_factors()
    {
        // (λ-1)^2 (λ+2)^3 (λ-5) has square-free part (λ-1)(λ+2)(λ-5) (common practice).
        var p = UnivariatePolynomial.FromRoots<Rational>(1, 1, -2, -2, -2, 5);
        Assert.Equal(UnivariatePolynomial.FromRoots<Rational>(-2, 1, 5), UnivariatePolynomial.SquareFreePart(p));
        var q = UnivariatePolynomial.FromRoots<Rational>(1, 7, -2);
        Assert.Equal(UnivariatePolynomial.FromRoots<Rational>(1, -2), UnivariatePolynomial.Gcd(p, q));
        Assert.Equal((3, UnivariatePolynomial.FromRoots<Rational>(1, 1, 5)), UnivariatePolynomial.RootMultiplicity(p, -2));
    }

    [Fact]
    public void Derivative_evaluation_and_powers_follow_the_usual_rules()
    {
        var p = P(1, 2, 3); // 3λ^2 + 2λ + 1
        Assert.Equal(P(2, 6), p.Derivative());
        Assert.Equal((Rational)17, p.Evaluate(2));
        Assert.Equal(p * p * p, p.Pow(3));
        // Product rule (common practice).
        var q = P(-4, 0, 1, 1);
        Assert.Equal(p.Derivative() * q + p * q.Derivative(), (p * q).Derivative());
    }

    [Fact]
    public void Polynomial_ring_axioms_hold_on_random_polynomials()
    {
        // Commutative ring axioms (common practice).
        var random = new Random(11);
        UnivariatePolynomial<GaussianRational> Next() => UnivariatePolynomial<GaussianRational>.FromCoefficients(
            Enumerable.Range(0, random.Next(0, 5)).Select(_ => new GaussianRational(new Rational(random.Next(-5, 6), random.Next(1, 4)), random.Next(-3, 4))));
        for (var iteration = 0; iteration < 40 * MatrixTestSupport.Iterations; iteration++)
        {
            var (a, b, c) = (Next(), Next(), Next());
            var context = $"a = {a}, b = {b}, c = {c}";
            Assert.True((a + b) + c == a + (b + c), context);
            Assert.True((a * b) * c == a * (b * c), context);
            Assert.True(a * b == b * a, context);
            Assert.True(a * (b + c) == a * b + a * c, context);
            Assert.True(a - a == UnivariatePolynomial<GaussianRational>.Zero, context);
            Assert.True(a * UnivariatePolynomial<GaussianRational>.One == a, context);
            var copy = UnivariatePolynomial<GaussianRational>.FromCoefficients(a.Coefficients.Append(GaussianRational.Zero));
            Assert.True(copy == a && copy.GetHashCode() == a.GetHashCode(), context);
            Assert.True((a * b).Degree == (a.IsZero || b.IsZero ? -1 : a.Degree + b.Degree), context);
            var point = new GaussianRational(random.Next(-3, 4), random.Next(-3, 4));
            Assert.True((a * b).Evaluate(point) == a.Evaluate(point) * b.Evaluate(point), context);
        }
    }
}
