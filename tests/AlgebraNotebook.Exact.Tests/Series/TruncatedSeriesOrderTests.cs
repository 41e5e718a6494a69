using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Big-O bookkeeping: orders, parameters, truncation and coefficient access.</summary>
public class TruncatedSeriesOrderTests
{
    private static readonly Symbol T = Symbol.Of("t");

    [Fact]
    public void Combining_two_series_keeps_the_smaller_order()
    {
        var fine = TruncatedSeries<Rational>.Parameter(T, 5);
        var coarse = TruncatedSeries<Rational>.Parameter(T, 3);
        Assert.Equal(3, (fine + coarse).Order);
        Assert.Equal(3, (fine * coarse).Order);
        Assert.Equal("t^2 + O(t^3)", (fine * coarse).ToString());
        Assert.Equal("O(t^5)", fine.Pow(5).ToString());
    }

    [Fact]
    public void Zero_and_one_are_exact_and_combine_with_any_order()
    {
        Assert.Equal(TruncatedSeries<Rational>.ExactOrder, TruncatedSeries<Rational>.Zero.Order);
        Assert.Equal(int.MaxValue, TruncatedSeries<Rational>.One.Order);
        Assert.Empty(TruncatedSeries<Rational>.One.Parameters);
        var t = TruncatedSeries<Rational>.Parameter(T, 4);
        Assert.Equal(t, t + TruncatedSeries<Rational>.Zero);
        Assert.Equal(t, t * TruncatedSeries<Rational>.One);
        Assert.Equal("O(t^4)", (t * TruncatedSeries<Rational>.Zero).ToString());
        Assert.False((t - t).IsZero);
        Assert.True((t - t).AgreesWith(TruncatedSeries<Rational>.Zero));
        Assert.True(TruncatedSeries<Rational>.Constant(Rational.Zero).IsZero);
        Assert.True(TruncatedSeries<Rational>.FromInteger(1).IsOne);
    }

    [Fact]
    public void Coefficients_below_the_order_are_known_and_the_rest_are_not()
    {
        var e = TruncatedSeries<Rational>.Parameter(T, 4).Exp();
        Assert.Equal(new Rational(1, 6), e.CoefficientOf(T, 3));
        Assert.Equal(Rational.One, e.ConstantTerm);
        var error = Assert.Throws<ExactArgumentException>(() => e.CoefficientOf(T, 4));
        Assert.Contains("t^4", error.Message);
        Assert.Contains("unknown", error.Message);
        // A symbol that is not a parameter never occurs: its coefficient is exactly zero.
        Assert.Equal(Rational.Zero, e.Coefficient(Monomial.Of(Symbol.Of("elsewhere"))));
        Assert.Throws<ExactArgumentException>(() => e.Truncate(0).ConstantTerm);
    }

    [Fact]
    public void Truncation_lowers_but_never_raises_the_order()
    {
        var e = TruncatedSeries<Rational>.Parameter(T, 6).Exp();
        Assert.Equal(e, e.Truncate(10));
        Assert.Equal("1 + t + O(t^2)", e.Truncate(2).ToString());
        Assert.Throws<ExactArgumentException>(() => e.Truncate(-1));
        var exact = TruncatedSeries<Rational>.FromTerms([(Monomial.Of(T, 3), Rational.One), (Monomial.One, Rational.One)], TruncatedSeries<Rational>.ExactOrder);
        Assert.Equal("1 + O(t^2)", exact.Truncate(2).ToString());
    }

    [Fact]
    public void FromTerms_adds_repeated_monomials_and_drops_zeros_and_high_terms()
    {
        var m = Monomial.Of(T, 2);
        var series = TruncatedSeries<Rational>.FromTerms(
            [(m, new Rational(1, 2)), (Monomial.Of(T), Rational.Zero), (m, new Rational(1, 3)), (Monomial.Of(T, 7), Rational.One)], 5);
        Assert.Equal("5/6*t^2 + O(t^5)", series.ToString());
        Assert.Single(series.Terms);
        Assert.Throws<ExactArgumentException>(() => TruncatedSeries<Rational>.FromTerms([], -1));
    }

    [Fact]
    public void Invalid_parameters_are_rejected_with_their_name()
    {
        var error = Assert.Throws<ExactArgumentException>(() => TruncatedSeries<Rational>.Parameter(T, 0));
        Assert.Contains("t", error.Message);
        Assert.Throws<ExactArgumentException>(() => TruncatedSeries<Rational>.Parameter("2t", 3));
    }

    [Fact]
    public void Equality_distinguishes_orders_and_parameters_of_the_unknown_tail()
    {
        var t3 = TruncatedSeries<Rational>.Parameter(T, 3);
        var t4 = TruncatedSeries<Rational>.Parameter(T, 4);
        var s3 = TruncatedSeries<Rational>.Parameter("order_s", 3);
        Assert.NotEqual(t3, t4);
        Assert.True(t3.AgreesWith(t4));
        Assert.NotEqual(t3 - t3, s3 - s3);
        Assert.True(t3 == t4.Truncate(3));
        Assert.Equal(t3.GetHashCode(), t4.Truncate(3).GetHashCode());
    }

    [Fact]
    public void Conjugation_conjugates_the_coefficients()
    {
        var t = TruncatedSeries<GaussianRational>.Parameter(T, 5);
        var f = (GaussianRational.I * t).Exp();
        Assert.Equal((-GaussianRational.I * t).Exp(), f.Conjugate());
    }

    [Fact]
    public void Coefficients_may_themselves_be_series()
    {
        // The generic code runs over any Q-algebra: here coefficients are series in u, and exp(u t) has [t^2] = u^2/2.
        var u = TruncatedSeries<Rational>.Parameter("order_u", 4);
        var t = TruncatedSeries<TruncatedSeries<Rational>>.Parameter(T, 4);
        var e = (u * t).Exp();
        Assert.Equal((u * u).Scale(new Rational(1, 2)), e.CoefficientOf(T, 2));
        Assert.Equal(u.Pow(3).Scale(new Rational(1, 6)), e.CoefficientOf(T, 3));
    }
}
