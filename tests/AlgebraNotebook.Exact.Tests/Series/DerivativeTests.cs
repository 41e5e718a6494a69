using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Partial derivatives of truncated series; the order drops by one.</summary>
public class DerivativeTests
{
    private static readonly Symbol X = Symbol.Of("x");
    private static readonly Symbol Y = Symbol.Of("y");

    [Fact]
    public void Derivative_of_exp_is_exp_known_to_one_order_less()
    {
        // d/dx e^x = e^x, d/dx sin x = cos x, d/dx log(1+x) = 1/(1+x) (common practice).
        var x = TruncatedSeries<Rational>.Parameter(X, 12);
        Assert.Equal(x.Exp().Truncate(11), x.Exp().Derivative(X));
        Assert.Equal(x.Cos().Truncate(11), x.Sin().Derivative(X));
        Assert.Equal(-x.Sin().Truncate(11), x.Cos().Derivative(X));
        var onePlusX = TruncatedSeries<Rational>.One + x;
        Assert.Equal(onePlusX.Reciprocal().Truncate(11), onePlusX.Log().Derivative(X));
        Assert.Equal(11, x.Exp().Derivative(X).Order);
    }

    [Fact]
    public void Partial_derivatives_in_two_parameters()
    {
        var x = TruncatedSeries<Rational>.Parameter(X, 6);
        var y = TruncatedSeries<Rational>.Parameter(Y, 6);
        var f = (x * x * y).Scale(3) + y.Pow(3);
        Assert.Equal(((x * y).Scale(6)).Truncate(5), f.Derivative(X));
        Assert.Equal((x * x).Scale(3).Truncate(5) + (y * y).Scale(3), f.Derivative(Y));
        // A symbol that is not a parameter: the derivative is exactly zero.
        Assert.True(f.Derivative(Symbol.Of("not_a_parameter")).IsZero);
    }

    [Fact]
    public void Product_rule_holds_on_random_series()
    {
        var random = Axioms.RandomisedTesting.NewRandom(302);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(30); iteration++)
        {
            var f = RandomSeries(random);
            var g = RandomSeries(random);
            var left = (f * g).Derivative(X);
            var right = f.Derivative(X) * g + f * g.Derivative(X);
            Assert.True(left.AgreesWith(right), $"(fg)' != f'g + fg' for f = {f}, g = {g}: {left} vs {right}");
        }
    }

    [Fact]
    public void Exact_polynomials_stay_exact()
    {
        var p = TruncatedSeries<Rational>.FromTerms([(Monomial.Of(X, 3), new Rational(2))], TruncatedSeries<Rational>.ExactOrder);
        var derivative = p.Derivative(X);
        Assert.True(derivative.IsExact);
        Assert.Equal("6*x^2", derivative.ToString());
    }

    private static TruncatedSeries<Rational> RandomSeries(Random random)
    {
        var terms = Enumerable.Range(0, 6).Select(_ =>
        {
            var a = random.Next(0, 4);
            var b = random.Next(0, 4);
            return (Monomial.FromFactors([(X, a), (Y, b)]), new Rational(random.Next(-6, 7), random.Next(1, 4)));
        });
        return TruncatedSeries<Rational>.FromTerms(terms, random.Next(2, 8), [X, Y]);
    }
}
