using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Exp, Log, Sin, Cos, reciprocals and powers outside their domain give clear errors naming the input.</summary>
public class FunctionDomainTests
{
    private static readonly TruncatedSeries<Rational> Tt = TruncatedSeries<Rational>.Parameter("t", 5);
    private static readonly TruncatedSeries<Rational> Two = TruncatedSeries<Rational>.FromInteger(2);

    [Fact]
    public void Exp_sin_and_cos_need_a_zero_constant_term()
    {
        var error = Assert.Throws<ExactArgumentException>(() => (Two + Tt).Exp());
        Assert.Contains("2 + t + O(t^5)", error.Message);
        Assert.Contains("constant term is 2", error.Message);
        Assert.Contains("not in the coefficient ring", error.Message);
        Assert.Throws<ExactArgumentException>(() => (Two + Tt).Sin());
        Assert.Throws<ExactArgumentException>(() => (Two + Tt).Cos());
    }

    [Fact]
    public void Log_needs_constant_term_one()
    {
        var error = Assert.Throws<ExactArgumentException>(() => (Two + Tt).Log());
        Assert.Contains("must be 1", error.Message);
        Assert.Throws<ExactArgumentException>(() => Tt.Log());
    }

    [Fact]
    public void Reciprocal_of_a_series_with_zero_constant_term_is_a_division_by_zero()
    {
        var error = Assert.Throws<DivideByZeroException>(() => Tt.Reciprocal());
        Assert.Contains("t + O(t^5)", error.Message);
        Assert.Throws<DivideByZeroException>(() => Tt.Divide(Tt));
        Assert.Throws<ExactArgumentException>(() => (Two + Tt).Reciprocal(Rational.One));
    }

    [Fact]
    public void Exact_non_constant_series_must_be_truncated_before_exp()
    {
        var exact = TruncatedSeries<Rational>.FromTerms([(Monomial.Of(Symbol.Of("t")), Rational.One)], TruncatedSeries<Rational>.ExactOrder);
        var error = Assert.Throws<ExactArgumentException>(() => exact.Exp());
        Assert.Contains("Truncate", error.Message);
        Assert.Throws<ExactArgumentException>(() => (TruncatedSeries<Rational>.One + exact).Reciprocal());
        Assert.Equal(TruncatedSeries<Rational>.One, TruncatedSeries<Rational>.Zero.Exp());
        Assert.Equal(new Rational(1, 2), Two.Reciprocal().ConstantTerm);
    }

    [Fact]
    public void Unknown_constant_terms_are_reported()
    {
        var unknown = Tt.Truncate(0);
        Assert.Contains("unknown", Assert.Throws<ExactArgumentException>(() => unknown.Exp()).Message);
        Assert.Contains("unknown", Assert.Throws<ExactArgumentException>(() => unknown.Reciprocal()).Message);
    }

    [Fact]
    public void Negative_and_fractional_powers()
    {
        // 1/(1 + t) = 1 - t + t^2 - ... (geometric series).
        var geometric = (TruncatedSeries<Rational>.One + Tt).Pow(-1);
        Assert.Equal("1 - t + t^2 - t^3 + t^4 + O(t^5)", geometric.ToString());
        Assert.Throws<ExactArgumentException>(() => (Two + Tt).Pow(-1));
        Assert.Equal((Two + Tt).Reciprocal().Pow(2), (Two + Tt).Reciprocal() * (Two + Tt).Reciprocal());
        Assert.Throws<ExactArgumentException>(() => (Two + Tt).Pow(new Rational(1, 2)));
        Assert.Equal((TruncatedSeries<Rational>.One + Tt).Pow(3), (TruncatedSeries<Rational>.One + Tt).Pow(new Rational(3)));
    }

    [Fact]
    public void Cube_root_matches_a_floating_point_evaluation()
    {
        // Reference: (1.2)^(1/3) in double precision; the binomial series converges for |t| < 1.
        var t = TruncatedSeries<Rational>.Parameter("t", 40);
        var root = (TruncatedSeries<Rational>.One + t).Pow(new Rational(1, 3));
        var value = root.Terms.Sum(term => term.Coefficient.ToDouble() * Math.Pow(0.2, term.Monomial.TotalDegree));
        Assert.Equal(Math.Pow(1.2, 1.0 / 3.0), value, 13);
        Assert.Equal(TruncatedSeries<Rational>.One + t, root.Pow(3));
    }
}
