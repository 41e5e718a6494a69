using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Exp and Log as mutually inverse maps between series with constant term 0 and 1 (common practice).</summary>
public class ExpLogTests
{
    private static readonly Symbol X = Symbol.Of("x");

    [Fact]
    public void Exp_of_log_of_one_plus_x_is_one_plus_x_to_order_20()
    {
        var onePlusX = TruncatedSeries<Rational>.One + TruncatedSeries<Rational>.Parameter(X, 20);
        var result = onePlusX.Log().Exp();
        Assert.Equal(onePlusX, result);
        Assert.Equal("1 + x + O(x^20)", result.ToString());
    }

    [Fact]
    public void Log_of_exp_of_x_is_x_to_order_20()
    {
        var x = TruncatedSeries<Rational>.Parameter(X, 20);
        Assert.Equal(x, x.Exp().Log());
    }

    [Fact]
    public void Exp_has_coefficients_one_over_n_factorial_and_log_has_alternating_one_over_n()
    {
        // e^x = sum x^n/n!, log(1 + x) = sum (-1)^(n+1) x^n/n (Abramowitz and Stegun 4.2.1 and 4.1.24).
        var x = TruncatedSeries<Rational>.Parameter(X, 25);
        var exp = x.Exp();
        var log = (TruncatedSeries<Rational>.One + x).Log();
        for (var n = 0; n < 25; n++)
        {
            Assert.Equal(SeriesTestHelpers.Factorial(n).Reciprocal(), exp.CoefficientOf(X, n));
            Assert.Equal(n == 0 ? Rational.Zero : new Rational(n % 2 == 1 ? 1 : -1, n), log.CoefficientOf(X, n));
        }
    }

    [Fact]
    public void Exp_and_log_invert_each_other_on_random_series_in_two_parameters()
    {
        var y = Symbol.Of("y");
        var random = Axioms.RandomisedTesting.NewRandom(201);
        for (var iteration = 0; iteration < Axioms.RandomisedTesting.Iterations(10); iteration++)
        {
            var terms = new List<(Monomial, Rational)>();
            for (var k = 0; k < 6; k++)
            {
                var degree = random.Next(1, 5);
                var ofX = random.Next(0, degree + 1);
                terms.Add((Monomial.FromFactors([(X, ofX), (y, degree - ofX)]), new Rational(random.Next(-5, 6), random.Next(1, 4))));
            }

            var f = TruncatedSeries<Rational>.FromTerms(terms, 7, [X, y]);
            Assert.True(f.Exp().Log() == f, $"log(exp(f)) != f for f = {f}: {f.Exp().Log()}");
            var g = TruncatedSeries<Rational>.One + f;
            Assert.True(g.Log().Exp() == g, $"exp(log(g)) != g for g = {g}");
            // exp(f + g) = exp(f) exp(g) (functional equation, common practice).
            Assert.True((f + f).Exp() == f.Exp() * f.Exp(), $"exp(2f) != exp(f)^2 for f = {f}");
        }
    }

    [Fact]
    public void Exp_of_i_x_is_cos_x_plus_i_sin_x_over_the_Gaussian_rationals()
    {
        // Euler's formula e^{ix} = cos x + i sin x (Abramowitz and Stegun 4.3.47).
        var x = TruncatedSeries<GaussianRational>.Parameter(X, 16);
        var left = (GaussianRational.I * x).Exp();
        var right = x.Cos() + GaussianRational.I * x.Sin();
        Assert.Equal(right, left);
        Assert.Equal(new GaussianRational(Rational.Zero, new Rational(-1, 6)), left.CoefficientOf(X, 3));
    }

    [Fact]
    public void Exp_matches_a_floating_point_evaluation_from_MathNet()
    {
        var x = TruncatedSeries<Rational>.Parameter(X, 30);
        var f = x - x.Pow(2).Scale(new Rational(1, 3));
        var value = 0.3;
        double Evaluate(TruncatedSeries<Rational> series) =>
            series.Terms.Sum(t => t.Coefficient.ToDouble() * Math.Pow(value, t.Monomial.TotalDegree));

        // Reference: double-precision evaluation of exp(0.3 - 0.03) and log1p via MathNet.Numerics.
        var expected = Math.Exp(value - value * value / 3);
        Assert.Equal(expected, Evaluate(f.Exp()), 12);
        Assert.Equal(MathNet.Numerics.SpecialFunctions.Log1p(value), Evaluate((TruncatedSeries<Rational>.One + x).Log()), 12);
    }
}
