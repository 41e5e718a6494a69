using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using static AlgebraNotebook.Exact.Tests.Polynomials.PolynomialTestData;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

public class PolynomialParsingTests
{
    [Fact]
    public void Text_with_explicit_operators_prints_back_unchanged()
    {
        // Terms of different total degree: the order is fixed whatever the symbol ranking (common practice: graded orders).
        Assert.Equal("x^2*y - 2*hbar", Q("x^2*y - 2*hbar").ToString());
        Assert.Equal("1/2*x*y^3", Q("1/2 x y^3").ToString());
        Assert.Equal("-x^3 + 4", Q("4 - x^3").ToString());
        Assert.Equal("0", Q("x - x").ToString());
    }

    [Fact]
    public void Binomial_cube_expands_with_coefficients_1_3_3_1()
    {
        // Binomial theorem (common practice).
        Assert.Equal(Q("x^3 + 3 x^2 y + 3 x y^2 + y^3"), Q("(x+y)^3"));
    }

    [Fact]
    public void Leading_minus_applies_to_the_whole_product()
    {
        Assert.Equal(Q("b c - a c"), Q("-(a - b)*c"));
        Assert.Equal(Q("-1 * x^2"), Q("-x^2"));
        Assert.Equal(Q("x + y"), Q("x - -y"));
    }

    [Fact]
    public void Juxtaposition_multiplies()
    {
        Assert.Equal(Q("3*x"), Q("3x"));
        Assert.Equal(Q("2*hbar*t"), Q("2 hbar t"));
        Assert.Equal(Q("x^2 - 1"), Q("(x+1)(x-1)"));
        Assert.Equal(Q("x*y"), Q("x y"));
        Assert.NotEqual(Q("x*y"), Q("xy"));
        Assert.Equal(Q("1/2*x"), Q("x/2"));
        Assert.Equal(Q("5/4"), Q("1.25"));
    }

    [Fact]
    public void Imaginary_unit_is_read_for_gaussian_coefficients()
    {
        var p = G("(1 - 2 i) x + i*hbar");
        Assert.Equal(new GaussianRational(1, -2), p.CoefficientOf(Monomial.Of(S("x"))));
        Assert.Equal(GaussianRational.I, p.CoefficientOf(Monomial.Of(S("hbar"))));
        Assert.Equal(G("-1"), G("i^2"));
        Assert.Equal(G("2*i*x"), G("2i x"));
    }

    [Fact]
    public void Printing_then_parsing_gives_the_same_polynomial_for_random_inputs()
    {
        var random = new Random(20261201);
        var symbols = new[] { S("pa"), S("pb"), S("hbar") };
        for (var k = 0; k < Iterations(200); k++)
        {
            var p = RandomPolynomial(random, symbols, RandomRational);
            Assert.True(Q(p.ToString()) == p, $"Rational round trip failed for {p}");
            var g = RandomPolynomial(random, symbols, RandomGaussian);
            Assert.True(G(g.ToString()) == g, $"GaussianRational round trip failed for {g}");
        }
    }

    [Theory]
    [InlineData("x^-1", 2, "negative exponents")]
    [InlineData("x^", 2, "expected an exponent")]
    [InlineData("2**x", 2, "'**'")]
    [InlineData("(x+y", 0, "unmatched '('")]
    [InlineData("x+y)", 3, "unmatched ')'")]
    [InlineData("x + ", 4, "unexpected end")]
    [InlineData("x *", 3, "unexpected end")]
    [InlineData("", 0, "empty")]
    [InlineData("x^2^3", 3, "parentheses")]
    [InlineData("x / y", 4, "non-constant")]
    [InlineData("x/0", 2, "division by zero")]
    [InlineData("x $ y", 2, "'$'")]
    [InlineData("2 3", 2, "number directly after")]
    [InlineData("x = 1", 2, "'='")]
    [InlineData("x^1.5", 3, "integers")]
    [InlineData("()", 1, "empty parentheses")]
    [InlineData("3 + i x", 4, "Rational coefficients have no i")]
    public void Bad_text_is_rejected_at_the_offending_character(string text, int position, string problem)
    {
        var error = Assert.Throws<ExactParseException>(() => Q(text));
        Assert.Equal(position, error.Position);
        Assert.Contains(problem, error.Message, StringComparison.Ordinal);
        Assert.Equal(text, error.Input);
    }

    [Fact]
    public void The_imaginary_unit_error_suggests_gaussian_rationals()
    {
        var error = Assert.Throws<ExactParseException>(() => Q("i*hbar"));
        Assert.Contains("GaussianRational", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_power_divided_by_a_number_follows_ordinary_precedence()
    {
        // Common practice: '^' binds tighter than '/', so x^2/3 is (x^2)/3, not x^(2/3).
        Assert.Equal(Q("1/3 theta^2"), Q("theta^2/3"));
        Assert.Equal(Q("(x + y)^2 * 1/4"), Q("(x + y)^2/4"));
    }

    [Fact]
    public void TryParse_returns_false_on_bad_text()
    {
        Assert.False(Polynomial<Rational>.TryParse("x^", out _));
        Assert.True(Polynomial<Rational>.TryParse("x^2", out var p));
        Assert.Equal(2, p.TotalDegree);
    }

    [Fact]
    public void Variable_and_constant_constructors_agree_with_parsing()
    {
        Assert.Equal(Q("theta"), Polynomial<Rational>.Variable("theta"));
        Assert.Equal(Q("theta"), Polynomial<Rational>.Variable(Symbol.Of("theta")));
        Assert.Equal(Q("7/3"), Polynomial<Rational>.Constant(new Rational(7, 3)));
        Assert.Same(Polynomial<Rational>.Zero, Polynomial<Rational>.Constant(Rational.Zero));
        Assert.Throws<ExactArgumentException>(() => Polynomial<Rational>.Variable("2x"));
    }
}
