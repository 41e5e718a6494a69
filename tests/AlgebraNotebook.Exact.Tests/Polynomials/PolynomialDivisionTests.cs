using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Polynomials.PolynomialTestData;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

public class PolynomialDivisionTests
{
    private static MonomialOrder LexXY => new(MonomialOrderKind.Lexicographic, [S("x"), S("y")]);

    [Fact]
    public void Division_by_two_polynomials_matches_the_first_textbook_example()
    {
        // Cox, Little & O'Shea (4th ed.), Section 2.3, Example 1: xy^2 + 1 divided by (xy + 1, y + 1), lex x > y,
        // gives quotients y and -1, remainder 2.
        var (q, r) = Q("x y^2 + 1").DivideWithRemainder([Q("x y + 1"), Q("y + 1")], LexXY);
        Assert.Equal(Q("y"), q[0]);
        Assert.Equal(Q("-1"), q[1]);
        Assert.Equal(Q("2"), r);
    }

    [Fact]
    public void Division_result_depends_on_the_divisor_order_as_in_the_textbook()
    {
        // Cox, Little & O'Shea (4th ed.), Section 2.3, Example 2 and the divisor swap discussed after it (from memory): x^2 y + x y^2 + y^2 divided by (xy - 1, y^2 - 1)
        // gives quotients x + y, 1 and remainder x + y + 1; with the divisors swapped, x + 1, x and remainder 2x + 1.
        var f = Q("x^2 y + x y^2 + y^2");
        var (q, r) = f.DivideWithRemainder([Q("x y - 1"), Q("y^2 - 1")], LexXY);
        Assert.Equal(Q("x + y"), q[0]);
        Assert.Equal(Q("1"), q[1]);
        Assert.Equal(Q("x + y + 1"), r);

        var (q2, r2) = f.DivideWithRemainder([Q("y^2 - 1"), Q("x y - 1")], LexXY);
        Assert.Equal(Q("x + 1"), q2[0]);
        Assert.Equal(Q("x"), q2[1]);
        Assert.Equal(Q("2 x + 1"), r2);
    }

    [Fact]
    public void Division_identity_holds_for_random_divisors()
    {
        var random = new Random(31);
        var symbols = new[] { S("va"), S("vb"), S("vc") };
        var orders = new[]
        {
            MonomialOrder.Default,
            new MonomialOrder(MonomialOrderKind.Lexicographic, [symbols[2], symbols[0], symbols[1]]),
            new MonomialOrder(MonomialOrderKind.GradedLexicographic, [symbols[1]]),
        };
        for (var k = 0; k < Iterations(100); k++)
        {
            var f = RandomPolynomial(random, symbols, RandomRational, maxTerms: 6, maxExponent: 3);
            var divisors = Enumerable.Range(0, random.Next(1, 4))
                .Select(_ => RandomPolynomial(random, symbols, RandomRational, maxTerms: 3))
                .Where(d => !d.IsZero).ToList();
            if (divisors.Count == 0)
            {
                continue;
            }

            var order = orders[random.Next(orders.Length)];
            var (q, r) = f.DivideWithRemainder(divisors, order);
            var recombined = r;
            for (var d = 0; d < divisors.Count; d++)
            {
                recombined += q[d] * divisors[d];
            }

            var message = $"f = {f}, divisors = [{string.Join("; ", divisors)}], order = {order}";
            Assert.True(recombined == f, "f != sum q_k d_k + r for " + message);
            foreach (var (m, _) in r.Terms)
            {
                Assert.DoesNotContain(divisors, d => d.LeadingMonomial(order).Divides(m));
            }
        }
    }

    [Fact]
    public void Exact_division_recovers_a_factor()
    {
        Assert.True(Polynomial<Rational>.TryDivideExact(Q("x^2 - y^2"), Q("x - y"), out var q));
        Assert.Equal(Q("x + y"), q);
        Assert.False(Polynomial<Rational>.TryDivideExact(Q("x^2 + 1"), Q("x + 1"), out _));
        Assert.False(Polynomial<Rational>.TryDivideExact(Q("x"), Polynomial<Rational>.Zero, out _));
        Assert.True(Polynomial<Rational>.TryDivideExact(Polynomial<Rational>.Zero, Q("x"), out var zero));
        Assert.True(zero.IsZero);
    }

    [Fact]
    public void Exact_division_of_random_products_returns_the_other_factor()
    {
        var random = new Random(32);
        var symbols = new[] { S("wa"), S("wb"), S("wc") };
        for (var k = 0; k < Iterations(100); k++)
        {
            var a = RandomPolynomial(random, symbols, RandomGaussian);
            var b = RandomPolynomial(random, symbols, RandomGaussian);
            if (b.IsZero)
            {
                continue;
            }

            Assert.True(Polynomial<GaussianRational>.TryDivideExact(a * b, b, out var q), $"({a})*({b}) not divisible by {b}");
            Assert.True(q == a, $"({a})*({b}) / ({b}) gave {q}");
            var shifted = a * b + Polynomial<GaussianRational>.One;
            if (!b.IsConstant)
            {
                Assert.False(Polynomial<GaussianRational>.TryDivideExact(shifted, b, out _), $"{shifted} claimed divisible by {b}");
            }
        }
    }

    [Fact]
    public void Division_by_a_zero_divisor_is_rejected_with_its_index()
    {
        var error = Assert.Throws<ExactArgumentException>(() => Q("x").DivideWithRemainder([Q("y"), Polynomial<Rational>.Zero]));
        Assert.Contains("divisor 1", error.Message, StringComparison.Ordinal);
    }
}
