using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Failing inputs found by the randomised axiom tests, kept as fixed cases.</summary>
public class TruncatedSeriesRegressionTests
{
    private static readonly Symbol X = Symbol.Of("regression_x");
    private static readonly Symbol Y = Symbol.Of("regression_y");

    [Fact]
    public void Distributivity_holds_when_the_difference_of_exact_factors_is_zero()
    {
        // Found with a = 2x + O(x^2), b = c = 1: an exact-zero shortcut in the product broke a(b - c) = ab - ac.
        var a = TruncatedSeries<Rational>.Parameter(X, 2).Scale(2);
        var one = TruncatedSeries<Rational>.One;
        Assert.Equal(a * one - a * one, a * (one - one));
    }

    [Fact]
    public void Distributivity_holds_when_an_exact_zero_meets_a_term_beyond_the_order()
    {
        // Found with a = 0, b = -2y^3 (exact), c = O(x^2): the parameters of b must survive the product with 0.
        var a = TruncatedSeries<Rational>.Zero;
        var b = TruncatedSeries<Rational>.FromTerms([(Monomial.Of(Y, 3), new Rational(-2))], TruncatedSeries<Rational>.ExactOrder);
        var c = TruncatedSeries<Rational>.FromTerms([], 2, [X]);
        Assert.Equal(a * b + a * c, a * (b + c));
    }

    [Fact]
    public void Associativity_holds_when_a_product_of_exact_series_vanishes()
    {
        // Found with a = 1/4 + O(x^3), b = 1/2 + 3/2 x + 7/4 y^2, c = 0.
        var a = TruncatedSeries<Rational>.FromTerms([(Monomial.One, new Rational(1, 4))], 3, [X]);
        var b = TruncatedSeries<Rational>.FromTerms(
            [(Monomial.One, new Rational(1, 2)), (Monomial.Of(X), new Rational(3, 2)), (Monomial.Of(Y, 2), new Rational(7, 4))],
            TruncatedSeries<Rational>.ExactOrder);
        var c = TruncatedSeries<Rational>.Zero;
        Assert.Equal((a * b) * c, a * (b * c));
    }
}
