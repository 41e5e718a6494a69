using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>The exponential in two commuting parameters.</summary>
public class BivariateExpTests
{
    [Fact]
    public void Exp_x_times_exp_y_is_exp_of_x_plus_y_to_total_order_8()
    {
        // e^x e^y = e^(x+y) for commuting x, y (common practice).
        var x = TruncatedSeries<Rational>.Parameter("x", 8);
        var y = TruncatedSeries<Rational>.Parameter("y", 8);
        var product = x.Exp() * y.Exp();
        Assert.Equal((x + y).Exp(), product);
        Assert.Equal(8, product.Order);
        // All monomials x^a y^b with a + b < 8 appear, with coefficient 1/(a! b!).
        Assert.Equal(36, product.Terms.Count);
        foreach (var (monomial, coefficient) in product.Terms)
        {
            var a = monomial.ExponentOf(Symbol.Of("x"));
            var b = monomial.ExponentOf(Symbol.Of("y"));
            Assert.Equal((SeriesTestHelpers.Factorial(a) * SeriesTestHelpers.Factorial(b)).Reciprocal(), coefficient);
        }
    }

    [Fact]
    public void Terms_are_listed_by_ascending_total_degree()
    {
        var x = TruncatedSeries<Rational>.Parameter("x", 6);
        var y = TruncatedSeries<Rational>.Parameter("y", 6);
        var degrees = (x + y).Exp().Terms.Select(t => t.Monomial.TotalDegree).ToList();
        Assert.Equal(degrees.OrderBy(d => d).ToList(), degrees);
    }

    [Fact]
    public void Multinomial_theorem_for_the_square_of_x_plus_y()
    {
        // (x + y)^2 = x^2 + 2xy + y^2 (common practice).
        var x = TruncatedSeries<Rational>.Parameter("x", 5);
        var y = TruncatedSeries<Rational>.Parameter("y", 5);
        var square = (x + y).Pow(2);
        var xs = Symbol.Of("x");
        var ys = Symbol.Of("y");
        Assert.Equal(new Rational(2), square.Coefficient(Monomial.Of(xs) * Monomial.Of(ys)));
        Assert.Equal(Rational.One, square.Coefficient(Monomial.Of(xs, 2)));
        Assert.Equal(3, square.Terms.Count);
        // (x + y)^5 is beyond order 5: everything is unknown.
        Assert.Empty((x + y).Pow(5).Terms);
    }
}
