using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Polynomials.PolynomialTestData;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

public class PolynomialArithmeticTests
{
    [Fact]
    public void Difference_of_squares_factors()
    {
        // (x - y)(x + y) = x^2 - y^2 (common practice).
        Assert.Equal(Q("x^2 - y^2"), Q("x - y") * Q("x + y"));
    }

    [Fact]
    public void Sum_of_cubes_factors()
    {
        // x^3 + y^3 = (x + y)(x^2 - x y + y^2) (common practice).
        Assert.Equal(Q("x^3 + y^3"), Q("x + y") * Q("x^2 - x y + y^2"));
    }

    [Fact]
    public void Cancelling_terms_leave_the_shared_zero()
    {
        var p = Q("3 x^2 y - z");
        Assert.True((p - p).IsZero);
        Assert.Same(Polynomial<Rational>.Zero, p - p);
        Assert.Empty((p - p).Terms);
    }

    [Fact]
    public void Power_matches_repeated_multiplication()
    {
        var p = Q("x - 2 y + 1/3");
        var product = Polynomial<Rational>.One;
        for (var k = 0; k <= 6; k++)
        {
            Assert.Equal(product, p.Pow(k));
            product *= p;
        }

        Assert.Throws<ExactArgumentException>(() => p.Pow(-1));
    }

    [Fact]
    public void Coefficients_of_the_sixth_power_of_one_plus_x_are_binomial()
    {
        // Binomial coefficients C(6,k) = 1, 6, 15, 20, 15, 6, 1 (OEIS A007318, row 6).
        var p = Q("1 + x").Pow(6);
        var x = S("x");
        var expected = new[] { 1, 6, 15, 20, 15, 6, 1 };
        for (var k = 0; k <= 6; k++)
        {
            Assert.Equal(new Rational(expected[k]), p.CoefficientOf(Monomial.Of(x, k)));
        }
    }

    [Fact]
    public void Scalar_multiplication_and_division_act_on_every_coefficient()
    {
        var p = Q("2 x - 4 y");
        Assert.Equal(Q("x - 2 y"), p / new Rational(2));
        Assert.Equal(Q("3 x - 6 y"), new Rational(3, 2) * p);
        Assert.Equal(Q("3 x - 6 y"), p * new Rational(3, 2));
        Assert.Equal(Q("3 x - 6 y"), p.Scale(new Rational(3, 2)));
        Assert.True((p * Rational.Zero).IsZero);
        Assert.Throws<DivideByZeroException>(() => p / Rational.Zero);
    }

    [Fact]
    public void Terms_are_sorted_descending_in_the_default_order()
    {
        var random = new Random(7);
        var symbols = new[] { S("ta"), S("tb"), S("tc") };
        for (var k = 0; k < Iterations(100); k++)
        {
            var p = RandomPolynomial(random, symbols, RandomRational, maxTerms: 8);
            for (var t = 1; t < p.Terms.Count; t++)
            {
                Assert.True(
                    MonomialOrder.Default.Compare(p.Terms[t - 1].Monomial, p.Terms[t].Monomial) > 0,
                    $"terms of {p} are not strictly descending at {t}");
                Assert.False(p.Terms[t].Coefficient.IsZero, $"zero coefficient in {p}");
            }
        }
    }

    [Fact]
    public void Constant_term_degree_and_symbols_are_read_from_the_terms()
    {
        var p = Q("x^3 y - 2 y^2 + 5");
        Assert.Equal(new Rational(5), p.ConstantTerm);
        Assert.Equal(4, p.TotalDegree);
        Assert.Equal(3, p.DegreeIn(S("x")));
        Assert.Equal(2, p.DegreeIn(S("y")));
        Assert.Equal(0, p.DegreeIn(S("z")));
        Assert.Equal(new[] { S("x"), S("y") }.ToHashSet(), p.Symbols.ToHashSet());
        Assert.False(p.IsConstant);
        Assert.True(Q("7").IsConstant);
        Assert.Equal(Rational.Zero, Q("x").ConstantTerm);
        Assert.Equal(-1, Polynomial<Rational>.Zero.TotalDegree);
    }

    [Fact]
    public void Leading_terms_follow_the_three_textbook_orders()
    {
        // Cox, Little & O'Shea, Ideals, Varieties, and Algorithms (4th ed.), Section 2.2: f = 4xy^2z + 4z^2 - 5x^3 + 7x^2z^2
        // with x > y > z has leading term -5x^3 (lex), 7x^2z^2 (grlex), 4xy^2z (grevlex).
        var (x, y, z) = (S("x"), S("y"), S("z"));
        var f = Q("4 x y^2 z + 4 z^2 - 5 x^3 + 7 x^2 z^2");
        var lex = new MonomialOrder(MonomialOrderKind.Lexicographic, [x, y, z]);
        var grlex = new MonomialOrder(MonomialOrderKind.GradedLexicographic, [x, y, z]);
        var grevlex = new MonomialOrder(MonomialOrderKind.GradedReverseLexicographic, [x, y, z]);
        Assert.Equal((Q("x^3").LeadingMonomial(), new Rational(-5)), f.LeadingTerm(lex));
        Assert.Equal(Q("x^2 z^2").LeadingMonomial(), f.LeadingMonomial(grlex));
        Assert.Equal(new Rational(7), f.LeadingCoefficient(grlex));
        Assert.Equal(Q("x y^2 z").LeadingMonomial(), f.LeadingMonomial(grevlex));
        Assert.Throws<ExactArgumentException>(() => Polynomial<Rational>.Zero.LeadingTerm());
    }

    [Fact]
    public void Conjugation_conjugates_coefficients_and_keeps_variables()
    {
        // Variables are treated as real (the library's documented convention).
        Assert.Equal(G("(1 + 2 i) x - i y^2"), G("(1 - 2 i) x + i y^2").Conjugate());
        var real = Q("x + 1/2");
        Assert.Same(real, real.Conjugate());
    }

    [Fact]
    public void Content_and_primitive_part_clear_denominators()
    {
        // Content over Q: gcd of numerators over lcm of denominators (common practice).
        var p = Q("6 x + 4/3 y");
        Assert.Equal(new Rational(2, 3), p.Content());
        Assert.Equal(Q("9 x + 2 y"), p.PrimitivePart());
        Assert.Equal(Q("9 x + 2 y"), (-p).PrimitivePart());
        Assert.Equal(new GaussianRational(2, 0), G("(2 + 2 i) x + 4").Content());
        Assert.Equal(G("(1 + i) x + 2"), G("(2 + 2 i) x + 4").PrimitivePart());
        Assert.True(Polynomial<Rational>.Zero.Content().IsZero);
    }

    [Fact]
    public void Monic_divides_by_the_leading_coefficient_of_the_chosen_order()
    {
        var (x, y) = (S("x"), S("y"));
        var lex = new MonomialOrder(MonomialOrderKind.Lexicographic, [y, x]);
        Assert.Equal(Q("y - 2 x^3"), Q("3 y - 6 x^3").Monic(lex));
        Assert.Equal(Q("x^3 - 1/2 y"), Q("3 y - 6 x^3").Monic());
    }

    [Fact]
    public void Equal_polynomials_built_differently_have_equal_hash_codes()
    {
        var a = Q("(x + y)^2 - y^2");
        var b = Q("x^2") + Q("2 x y");
        Assert.Equal(a, b);
        Assert.Equal(a.GetHashCode(), b.GetHashCode());
        Assert.True(a == b);
        Assert.False(a != b);
    }
}
