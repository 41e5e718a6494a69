using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Plain-text form of truncated series (the format fixed by the API contract).</summary>
public class TruncatedSeriesTextTests
{
    // Created in this order so that text_a ranks above text_b within a degree.
    private static readonly Symbol A = Symbol.Of("text_a");
    private static readonly Symbol B = Symbol.Of("text_b");

    [Fact]
    public void Exp_of_t_to_order_3_reads_as_in_the_contract()
    {
        Assert.Equal("1 + t + 1/2*t^2 + O(t^3)", TruncatedSeries<Rational>.Parameter("t", 3).Exp().ToString());
    }

    [Fact]
    public void Negative_coefficients_are_written_with_a_minus_sign()
    {
        var t = TruncatedSeries<Rational>.Parameter("t", 6);
        Assert.Equal("t - 1/6*t^3 + 1/120*t^5 + O(t^6)", t.Sin().ToString());
        Assert.Equal("-t + O(t^6)", (-t).ToString());
        Assert.Equal("1 - t + O(t^6)", (TruncatedSeries<Rational>.One - t).ToString());
    }

    [Fact]
    public void Several_parameters_show_the_tail_as_a_power_of_their_ideal()
    {
        var a = TruncatedSeries<Rational>.Parameter(A, 3);
        var b = TruncatedSeries<Rational>.Parameter(B, 3);
        Assert.Equal("text_a^2 + 2*text_a*text_b + text_b^2 + O((text_a, text_b)^3)", (a + b).Pow(2).ToString());
        Assert.Equal("O(text_a, text_b)", (a + b).Truncate(1).ToString());
    }

    [Fact]
    public void Exact_series_unknown_series_and_compound_coefficients()
    {
        Assert.Equal("0", TruncatedSeries<Rational>.Zero.ToString());
        Assert.Equal("1", TruncatedSeries<Rational>.One.ToString());
        Assert.Equal("-3/4", TruncatedSeries<Rational>.Constant(new Rational(-3, 4)).ToString());
        var t = TruncatedSeries<Rational>.Parameter("t", 4);
        Assert.Equal("O(t^4)", (t - t).ToString());
        Assert.Equal("O(t)", t.Truncate(1).ToString());
        Assert.Equal("O(1)", t.Truncate(0).ToString());
        var exact = TruncatedSeries<Rational>.FromTerms([(Monomial.Of(Symbol.Of("t"), 2), new Rational(5))], TruncatedSeries<Rational>.ExactOrder);
        Assert.Equal("5*t^2", exact.ToString());
        var z = TruncatedSeries<GaussianRational>.Parameter("t", 3);
        Assert.Equal("(1 + 2 i)*t + O(t^3)", (GaussianRational.Parse("1 + 2i") * z).ToString());
        Assert.Equal("i*t + O(t^3)", (GaussianRational.I * z).ToString());
        Assert.Equal("-i*t + O(t^3)", (-GaussianRational.I * z).ToString());
        Assert.Equal("(2 i)*t + O(t^3)", (GaussianRational.Parse("2i") * z).ToString());
    }
}
