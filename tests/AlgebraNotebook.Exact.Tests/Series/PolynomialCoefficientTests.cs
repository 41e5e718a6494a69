using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Series whose coefficients are polynomials in symbolic constants (the same generic code).</summary>
public class PolynomialCoefficientTests
{
    private static readonly Symbol T = Symbol.Of("poly_coeff_t");

    [Fact]
    public void Exp_of_a_times_t_has_coefficients_a_to_the_n_over_n_factorial()
    {
        // e^(a t) = sum a^n t^n / n! (common practice).
        var a = Polynomial<Rational>.Variable("poly_coeff_a");
        var t = TruncatedSeries<Polynomial<Rational>>.Parameter(T, 8);
        var e = (a * t).Exp();
        for (var n = 0; n < 8; n++)
        {
            Assert.Equal(a.Pow(n).Scale(SeriesTestHelpers.Factorial(n).Reciprocal()), e.CoefficientOf(T, n));
        }

        // e^(a t) e^(-a t) = 1 and log(e^(a t)) = a t.
        Assert.Equal(TruncatedSeries<Polynomial<Rational>>.One + (t - t), e * (-a * t).Exp());
        Assert.Equal(a * t, e.Log());
    }

    [Fact]
    public void A_unit_constant_term_can_be_inverted_with_the_given_inverse()
    {
        // 1/(1 - a t) = sum a^n t^n (geometric series); the coefficients are polynomials, not a field.
        var a = Polynomial<Rational>.Variable("poly_coeff_a");
        var t = TruncatedSeries<Polynomial<Rational>>.Parameter(T, 6);
        var inverse = (TruncatedSeries<Polynomial<Rational>>.One - a * t).Reciprocal(Polynomial<Rational>.One);
        for (var n = 0; n < 6; n++)
        {
            Assert.Equal(a.Pow(n), inverse.CoefficientOf(T, n));
        }
    }

    [Fact]
    public void Compound_coefficients_are_parenthesised_in_text()
    {
        var a = Polynomial<Rational>.Variable("poly_coeff_a");
        var b = Polynomial<Rational>.Variable("poly_coeff_b");
        var t = TruncatedSeries<Polynomial<Rational>>.Parameter(T, 3);
        Assert.Equal("(poly_coeff_a + poly_coeff_b)*poly_coeff_t + O(poly_coeff_t^3)", ((a + b) * t).ToString());
    }
}
