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
    public void Invalid_limits_are_refused()
    {
        Assert.Throws<ExactArgumentException>(() => P("x + 1").Pow(2, new PowerLimits { MaxTerms = 0 }));
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
