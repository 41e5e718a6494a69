using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

public class PolynomialPowerLimitTests
{
    private static Polynomial<Rational> P(string text) => Polynomial<Rational>.Parse(text);

    [Fact]
    public void Huge_power_of_a_binomial_is_refused_before_any_work_with_the_estimate()
    {
        var e = Assert.Throws<BeyondCapabilityException>(() => P("x + 1").Pow(int.MaxValue));
        Assert.Contains("total degree 2147483647", e.Message);
        Assert.Contains("PowerLimits", e.Message);
    }

    [Fact]
    public void Raised_limit_lets_a_power_through_that_a_lower_limit_refuses_and_the_middle_coefficient_is_the_central_binomial()
    {
        Assert.Throws<BeyondCapabilityException>(() => P("x + 1").Pow(600, new PowerLimits { MaxTotalDegree = 500 }));
        // (x + 1)^600: the coefficient of x^300 is C(600, 300) (binomial theorem, common practice).
        var result = P("x + 1").Pow(600, new PowerLimits { MaxTotalDegree = 600 });
        Assert.Equal(601, result.Terms.Count);
        var x = Symbol.Of("x");
        var middle = result.Terms.Single(t => t.Monomial.ExponentOf(x) == 300).Coefficient;
        var central = BigInteger.One;
        for (var j = 1; j <= 300; j++)
        {
            central = central * (300 + j) / j;
        }

        Assert.Equal(new Rational(central), middle);
    }

    [Fact]
    public void Term_estimate_uses_the_smaller_of_the_multiset_and_monomial_bounds()
    {
        // (x + y)^2000 has 2001 terms (binomial theorem); with MaxTerms 2001 it passes, with 2000 it is refused.
        Assert.Equal(2001, P("x + y").Pow(2000, new PowerLimits { MaxTerms = 2001 }).Terms.Count);
        Assert.Throws<BeyondCapabilityException>(() => P("x + y").Pow(2000, new PowerLimits { MaxTerms = 2000 }));
    }

    [Fact]
    public void A_single_term_is_raised_directly_without_the_degree_limit()
    {
        Assert.Equal(P("x^20000"), P("x").Pow(20_000));
    }

    [Fact]
    public void Huge_power_of_a_single_term_with_a_fractional_coefficient_is_refused_before_any_work_with_the_estimate()
    {
        // (x/2)^(2^31 - 1) has coefficient 2^-(2^31 - 1), a denominator of 2^31 bits (common practice); built in code.
        var half = Polynomial<Rational>.Variable("x") / new Rational(2);
        var e = Assert.Throws<BeyondCapabilityException>(() => half.Pow(int.MaxValue));
        Assert.Contains("(1/2*x)^2147483647", e.Message);
        Assert.Contains("coefficients of about 2.147E+09 bits", e.Message);
        Assert.Contains("PowerLimits", e.Message);
        // The same over Q(i): (i x / 2)^(2^31 - 1) (common practice: |i/2|^n = 2^-n).
        var gaussian = Polynomial<GaussianRational>.Parse("i x / 2");
        Assert.Throws<BeyondCapabilityException>(() => gaussian.Pow(int.MaxValue));
    }

    [Fact]
    public void Single_term_coefficient_limit_is_the_one_the_caller_sets()
    {
        // (x/2)^100000: estimate 100,000 bits, over the default 65,536; admitted with a larger limit, where the
        // coefficient is 2^-100000 (common practice).
        var half = Polynomial<Rational>.Variable("x") / new Rational(2);
        Assert.Throws<BeyondCapabilityException>(() => half.Pow(100_000));
        var result = half.Pow(100_000, new PowerLimits { MaxCoefficientBits = 100_000 });
        var (monomial, coefficient) = Assert.Single(result.Terms);
        Assert.Equal(100_000, monomial.TotalDegree);
        Assert.Equal(new Rational(BigInteger.One, BigInteger.Pow(2, 100_000)), coefficient);
    }

    [Fact]
    public void Single_term_whose_degree_would_pass_the_largest_int_is_refused_whatever_the_limits()
    {
        // 2 * 1,500,000,000 = 3,000,000,000 > 2^31 - 1 (common practice): an error, never a wrapped-around exponent.
        var square = P("x^2");
        var huge = new PowerLimits { MaxTotalDegree = long.MaxValue, MaxTerms = long.MaxValue, MaxCoefficientBits = long.MaxValue };
        var e = Assert.Throws<BeyondCapabilityException>(() => square.Pow(1_500_000_000, huge));
        Assert.Contains("(x^2)^1500000000", e.Message);
        Assert.Contains("total degree 3000000000", e.Message);
        var m = Assert.Throws<BeyondCapabilityException>(() => Monomial.Of(Symbol.Of("x"), 2).Pow(1_500_000_000));
        Assert.Contains("(x^2)^1500000000", m.Message);
        // Several terms with every limit lifted: (x^2 + 1)^1500000000 would have total degree 3,000,000,000.
        var b = Assert.Throws<BeyondCapabilityException>(() => P("x^2 + 1").Pow(1_500_000_000, huge));
        Assert.Contains("total degree 3000000000", b.Message);
    }

    [Fact]
    public void Repeated_factors_whose_exponents_pass_the_largest_int_are_refused_not_wrapped_around()
    {
        // (2^31 - 1) + 1 = 2^31 does not fit in an int (common practice).
        var x = Symbol.Of("x");
        var e = Assert.Throws<ExactArgumentException>(() => Monomial.FromFactors([(x, int.MaxValue), (x, 1)]));
        Assert.Contains("x add up to 2147483648", e.Message);
        var t = Assert.Throws<ExactArgumentException>(() => Monomial.FromFactors([(x, int.MaxValue), (Symbol.Of("y"), 1)]));
        Assert.Contains("total degree 2147483648", t.Message);
    }

    [Fact]
    public void Several_terms_with_a_large_coefficient_are_refused_by_the_coefficient_estimate()
    {
        // (c x + 1)^100 with c = 2^1000: the leading coefficient is 2^100000 (binomial theorem, common practice), over
        // 65,536 bits; degree 100 and 101 terms are far inside their limits.
        var c = new Rational(BigInteger.Pow(2, 1000));
        var p = Polynomial<Rational>.Variable("x") * c + Polynomial<Rational>.One;
        var e = Assert.Throws<BeyondCapabilityException>(() => p.Pow(100));
        Assert.Contains("^100 would have coefficients of about", e.Message);
    }

    [Fact]
    public void Ordinary_power_of_half_x_plus_one_matches_the_binomial_theorem()
    {
        // (x/2 + 1)^20 = sum_k C(20, k) 2^-k x^k (binomial theorem, common practice); and (x/2)^20 = x^20 / 2^20.
        var x = Symbol.Of("x");
        var half = Polynomial<Rational>.Variable("x") / new Rational(2);
        var single = Assert.Single(half.Pow(20).Terms);
        Assert.Equal(20, single.Monomial.ExponentOf(x));
        Assert.Equal(new Rational(1, 1 << 20), single.Coefficient);
        var result = (half + Polynomial<Rational>.One).Pow(20);
        Assert.Equal(21, result.Terms.Count);
        var binomial = BigInteger.One;
        for (var k = 0; k <= 20; k++)
        {
            var coefficient = result.Terms.Single(t => t.Monomial.ExponentOf(x) == k).Coefficient;
            Assert.Equal(new Rational(binomial, BigInteger.Pow(2, k)), coefficient);
            binomial = binomial * (20 - k) / (k + 1);
        }
    }

    [Fact]
    public void Invalid_limits_are_refused()
    {
        Assert.Throws<ExactArgumentException>(() => P("x + 1").Pow(2, new PowerLimits { MaxTerms = 0 }));
        Assert.Throws<ExactArgumentException>(() => P("x + 1").Pow(2, new PowerLimits { MaxCoefficientBits = 0 }));
    }

    [Fact]
    public void Text_asking_for_a_moderate_power_is_parsed_and_a_huge_expansion_is_refused_by_the_parse_budget()
    {
        // (x + 1)^100 has 101 terms and the coefficient of x^1 is 100 (binomial theorem, common practice).
        var p = P("(x + 1)^100");
        Assert.Equal(101, p.Terms.Count);
        Assert.Contains(p.Terms, t => t.Monomial.ExponentOf(Symbol.Of("x")) == 1 && t.Coefficient == new Rational(100));
        var e = Assert.Throws<BeyondCapabilityException>(() => P("(x + y + z + w)^60"));
        Assert.Contains("(x + y + z + w)^60", e.Message);
    }
}
