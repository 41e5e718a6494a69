using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;

namespace AlgebraNotebook.Display.Tests.Conversion;

public class SeriesDisplayTests
{
    [Fact]
    public void Exponential_series_with_order_term_matches_approved_outputs()
    {
        // exp(t) = 1 + t + t^2/2 + t^3/6 + O(t^4): Abramowitz and Stegun, Handbook of Mathematical Functions, 4.2.1.
        var series = TruncatedSeries<Rational>.Parameter("t", 4).Exp();
        Approvals.VerifyAllFormats("Series_exponential_order_four", series);
    }

    [Fact]
    public void Plain_text_of_series_agrees_with_ToString()
    {
        // TruncatedSeries<T>.ToString documents "1 + t + 1/2*t^2 + O(t^3)" and "O((x, y)^3)".
        var s = TruncatedSeries<GaussianRational>.Parameter("s", 3);
        var u = TruncatedSeries<GaussianRational>.Parameter("u", 3);
        var samples = new[]
        {
            TruncatedSeries<GaussianRational>.Parameter("t", 3).Exp(),
            s * u - s + GaussianRational.Parse("1/2 - i") * u,
            (s + u).Sin(),
            TruncatedSeries<GaussianRational>.Parameter("t", 1),
            TruncatedSeries<GaussianRational>.One,
            TruncatedSeries<GaussianRational>.Zero,
        };
        foreach (var series in samples)
        {
            Assert.Equal(series.ToString(), MathDisplay.ToPlainText(series));
        }
    }

    [Fact]
    public void Order_term_of_two_parameters_is_a_power_of_the_parameter_list()
    {
        var s = TruncatedSeries<Rational>.Parameter("s", 3);
        var u = TruncatedSeries<Rational>.Parameter("u", 3);
        var latex = MathDisplay.ToLatex(s + u);
        Assert.Equal("s + u + O((s, u)^{3})", latex);
        Assert.Equal("s + u + O((s, u)^3)", MathDisplay.ToPlainText(s + u));
    }

    [Fact]
    public void Series_with_polynomial_coefficients_renders_coefficients_recursively()
    {
        // e^(kappa tau) = sum kappa^n tau^n / n!: Abramowitz and Stegun, Handbook of Mathematical Functions, 4.2.1.
        var kappa = Polynomial<Rational>.Variable("kappa");
        var tau = TruncatedSeries<Polynomial<Rational>>.Parameter("tau", 4);
        var series = (kappa * tau).Exp();
        Assert.True(MathDisplay.CanRender(series));
        Assert.Equal(@"1 + \kappa \tau + \frac{1}{2} \kappa^{2} \tau^{2} + \frac{1}{6} \kappa^{3} \tau^{3} + O(\tau^{4})", MathDisplay.ToLatex(series));
        Assert.Equal("1 + kappa*tau + 1/2*kappa^2*tau^2 + 1/6*kappa^3*tau^3 + O(tau^4)", MathDisplay.ToPlainText(series));

        // A coefficient with several terms is parenthesised (common practice).
        var sum = (kappa + Polynomial<Rational>.One) * TruncatedSeries<Polynomial<Rational>>.Parameter("tau", 3);
        Assert.Equal("(kappa + 1)*tau + O(tau^3)", MathDisplay.ToPlainText(sum));
    }
}
