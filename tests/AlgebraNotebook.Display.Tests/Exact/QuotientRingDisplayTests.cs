using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Display.Tests.Exact;

public class QuotientRingDisplayTests
{
    private static Polynomial<Rational> P(string text) => Polynomial<Rational>.Parse(text);

    [Fact]
    public void Textbook_ideal_shows_relations_reduced_groebner_basis_and_the_order()
    {
        // Cox, Little, O'Shea, Ideals, Varieties, and Algorithms, ch. 2 §7: for I = <x^3 - 2xy, x^2 y - 2y^2 + x> under
        // graded lex with x > y the reduced Groebner basis is {x^2, xy, y^2 - x/2}.
        var order = new MonomialOrder(MonomialOrderKind.GradedLexicographic, [Symbol.Of("x"), Symbol.Of("y")]);
        var ring = new QuotientRing<Rational>([P("x^3 - 2*x*y"), P("x^2*y - 2*y^2 + x")], order: order);
        Assert.Equal(new[] { P("x^2"), P("x*y"), P("y^2 - 1/2*x") }.ToHashSet(), ring.GroebnerBasis.ToHashSet());
        Approvals.VerifyAllFormats("Exact_QuotientRing_textbook_graded_lex", ring);
        var plain = MathDisplay.ToPlainText(ring);
        Assert.Contains("[monomial order, graded lexicographic with x > y]", plain);
        Assert.Contains("[relations, x^3 - 2*x*y = 0, ", plain);
    }

    [Fact]
    public void Circle_relation_under_the_default_order()
    {
        // c^2 + s^2 = 1 is already a reduced Groebner basis (one monic generator; common practice).
        var ring = new QuotientRing<Rational>(["c^2 + s^2 = 1"]);
        Assert.Equal("[[relations, c^2 + s^2 - 1 = 0], [Groebner basis, {c^2 + s^2 - 1}], [monomial order, graded reverse lexicographic (symbols ranked by name)]]",
            MathDisplay.ToPlainText(ring));
    }

    [Fact]
    public void Ring_without_relations_says_none_and_has_an_empty_basis()
    {
        var ring = new QuotientRing<Rational>(Array.Empty<Polynomial<Rational>>());
        Assert.StartsWith("[[relations, none], [Groebner basis, {}]", MathDisplay.ToPlainText(ring));
    }

    [Fact]
    public void Groebner_statistics_are_shown_as_named_counts()
    {
        var statistics = new GroebnerStatistics(5, 4, 3, 1);
        Assert.Equal("S-pairs created = 5, S-pairs reduced = 4, reductions to zero = 3, polynomials added = 1",
            MathDisplay.ToPlainText(statistics));
        Assert.True(MathDisplay.CanRender(new QuotientRing<Rational>(["x^2 = 2"]).Statistics));
    }
}
