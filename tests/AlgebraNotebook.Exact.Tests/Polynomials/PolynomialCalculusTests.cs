using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using static AlgebraNotebook.Exact.Tests.Polynomials.PolynomialTestData;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

public class PolynomialCalculusTests
{
    [Fact]
    public void Derivative_of_a_monomial_sum_follows_the_power_rule()
    {
        // Power rule d/dx x^n = n x^(n-1) (common practice).
        var p = Q("x^3 y^2 + 2 x y - 7 y + 1");
        Assert.Equal(Q("3 x^2 y^2 + 2 y"), p.Derivative(S("x")));
        Assert.Equal(Q("2 x^3 y + 2 x - 7"), p.Derivative(S("y")));
        Assert.True(p.Derivative(S("z")).IsZero);
    }

    [Fact]
    public void Derivative_obeys_the_product_rule_on_random_polynomials()
    {
        // Leibniz rule (common practice).
        var random = new Random(11);
        var symbols = new[] { S("da"), S("db") };
        for (var k = 0; k < Iterations(100); k++)
        {
            var a = RandomPolynomial(random, symbols, RandomGaussian);
            var b = RandomPolynomial(random, symbols, RandomGaussian);
            var d = symbols[random.Next(2)];
            Assert.True(
                (a * b).Derivative(d) == a.Derivative(d) * b + a * b.Derivative(d),
                $"product rule fails for a = {a}, b = {b}, d/d{d}");
        }
    }

    [Fact]
    public void Substitution_replaces_a_symbol_and_expands()
    {
        var p = Q("x^2 + x y");
        Assert.Equal(Q("(y + 1)^2 + (y + 1) y"), p.Substitute(S("x"), Q("y + 1")));
        Assert.Equal(p, p.Substitute(S("z"), Q("y")));
        Assert.Equal(Q("y"), Q("x").Substitute(S("x"), Q("y")));
    }

    [Fact]
    public void Evaluation_agrees_with_substituting_constants()
    {
        var random = new Random(12);
        var symbols = new[] { S("ea"), S("eb"), S("ec") };
        for (var k = 0; k < Iterations(100); k++)
        {
            var p = RandomPolynomial(random, symbols, RandomGaussian);
            var values = symbols.ToDictionary(s => s, _ => RandomGaussian(random));
            var substituted = p;
            foreach (var (s, v) in values)
            {
                substituted = substituted.Substitute(s, Polynomial<GaussianRational>.Constant(v));
            }

            Assert.True(substituted.IsConstant, $"substitution left symbols in {substituted}");
            Assert.True(substituted.ConstantTerm == p.Evaluate(values), $"evaluation of {p} disagrees");
        }
    }

    [Fact]
    public void Evaluation_names_a_missing_symbol()
    {
        var error = Assert.Throws<ExactArgumentException>(
            () => Q("x + w").Evaluate(new Dictionary<Symbol, Rational> { [S("x")] = 1 }));
        Assert.Contains("w", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluating_x_squared_plus_one_at_i_gives_zero()
    {
        // i^2 = -1 (common practice).
        Assert.Equal(GaussianRational.Zero, G("x^2 + 1").Evaluate(new Dictionary<Symbol, GaussianRational> { [S("x")] = GaussianRational.I }));
    }
}
