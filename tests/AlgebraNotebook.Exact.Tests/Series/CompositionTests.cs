using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Substituting series for parameters (composition).</summary>
public class CompositionTests
{
    private static readonly Symbol X = Symbol.Of("x");
    private static readonly Symbol Y = Symbol.Of("y");

    [Fact]
    public void Log_one_plus_x_after_exp_y_minus_one_is_y()
    {
        // log(1 + (e^y - 1)) = y (common practice).
        var x = TruncatedSeries<Rational>.Parameter(X, 15);
        var y = TruncatedSeries<Rational>.Parameter(Y, 15);
        var log = (TruncatedSeries<Rational>.One + x).Log();
        var inner = y.Exp() - TruncatedSeries<Rational>.One;
        Assert.Equal(y, log.Substitute(X, inner));
        Assert.Equal(y, log.Compose(inner));
    }

    [Fact]
    public void Tan_after_arctan_is_the_identity()
    {
        // arctan x = sum (-1)^k x^(2k+1)/(2k+1) (Abramowitz and Stegun 4.4.42); tan(arctan x) = x.
        var arctan = SeriesTestHelpers.Univariate(X, 17, k => k % 2 == 1 ? new Rational(k % 4 == 1 ? 1 : -1, k) : Rational.Zero);
        var x = TruncatedSeries<Rational>.Parameter(X, 17);
        var (sine, cosine) = x.SineAndCosine();
        var tan = sine.Divide(cosine);
        Assert.Equal(x, tan.Compose(arctan));
        Assert.Equal(x, arctan.Compose(tan));
    }

    [Fact]
    public void Substituting_a_sum_into_exp_factors_the_exponential()
    {
        // e^(y + y^2) = e^y e^(y^2) (common practice).
        var x = TruncatedSeries<Rational>.Parameter(X, 12);
        var y = TruncatedSeries<Rational>.Parameter(Y, 12);
        Assert.Equal(y.Exp() * (y * y).Exp(), x.Exp().Substitute(X, y + y * y));
    }

    [Fact]
    public void Substituting_an_exact_square_keeps_the_known_terms()
    {
        // f(t) = 1 + t + t^2/2 + O(t^3) with t = u^2 is 1 + u^2 + u^4/2 + O(u^6): the tail O(t^3) becomes O(u^6).
        var t = Symbol.Of("comp_t");
        var u = Symbol.Of("comp_u");
        var f = TruncatedSeries<Rational>.Parameter(t, 3).Exp();
        var square = TruncatedSeries<Rational>.FromTerms([(Monomial.Of(u, 2), Rational.One)], TruncatedSeries<Rational>.ExactOrder);
        var result = f.Substitute(t, square);
        Assert.Equal("1 + comp_u^2 + 1/2*comp_u^4 + O(comp_u^6)", result.ToString());
        Assert.Equal([u], result.Parameters);
    }

    [Fact]
    public void Simultaneous_substitution_swaps_parameters()
    {
        var x = TruncatedSeries<Rational>.Parameter(X, 6);
        var y = TruncatedSeries<Rational>.Parameter(Y, 6);
        var f = x + (x * y).Scale(3) + y.Pow(2).Scale(new Rational(1, 2));
        var swapped = f.Compose(new Dictionary<Symbol, TruncatedSeries<Rational>> { [X] = y, [Y] = x });
        Assert.Equal(y + (x * y).Scale(3) + x.Pow(2).Scale(new Rational(1, 2)), swapped);
    }

    [Fact]
    public void An_exact_polynomial_accepts_a_replacement_with_a_constant_term()
    {
        // x^2 with x = 1 + t is 1 + 2t + t^2 (binomial theorem).
        var t = TruncatedSeries<Rational>.Parameter("t", 5);
        var square = TruncatedSeries<Rational>.FromTerms([(Monomial.Of(X, 2), Rational.One)], TruncatedSeries<Rational>.ExactOrder);
        Assert.Equal((TruncatedSeries<Rational>.One + t).Pow(2), square.Substitute(X, TruncatedSeries<Rational>.One + t));
    }

    [Fact]
    public void A_truncated_series_rejects_a_replacement_with_a_constant_term()
    {
        var x = TruncatedSeries<Rational>.Parameter(X, 5);
        var error = Assert.Throws<ExactArgumentException>(() => x.Exp().Substitute(X, TruncatedSeries<Rational>.One + x));
        Assert.Contains("constant term must be 0", error.Message);
        Assert.Contains("for x", error.Message);
        var twoParameters = x + TruncatedSeries<Rational>.Parameter(Y, 5);
        Assert.Throws<ExactArgumentException>(() => twoParameters.Compose(x));
    }

    [Fact]
    public void Substitution_agrees_with_direct_evaluation_on_random_polynomials()
    {
        // For a polynomial f and g with zero constant term, f(g) equals the sum of c * g^k computed by products.
        var random = Axioms.RandomisedTesting.NewRandom(301);
        var x = TruncatedSeries<Rational>.Parameter(X, 9);
        var y = TruncatedSeries<Rational>.Parameter(Y, 9);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(20); iteration++)
        {
            var coefficients = Enumerable.Range(0, 6).Select(_ => new Rational(random.Next(-5, 6), random.Next(1, 4))).ToArray();
            var f = SeriesTestHelpers.Univariate(X, 9, k => k < coefficients.Length ? coefficients[k] : Rational.Zero);
            var g = y.Scale(random.Next(-3, 4)) + (y * y).Scale(random.Next(-3, 4)) + y.Pow(3).Scale(new Rational(1, random.Next(1, 5)));
            var expected = TruncatedSeries<Rational>.Zero;
            for (var k = 0; k < coefficients.Length; k++)
            {
                expected += g.Pow(k).Scale(coefficients[k]);
            }

            var actual = f.Substitute(X, g);
            Assert.True(actual.AgreesWith(expected), $"f(g) disagrees for f = {f}, g = {g}: {actual} vs {expected}");
            Assert.Equal(9, actual.Order);
        }
    }
}
