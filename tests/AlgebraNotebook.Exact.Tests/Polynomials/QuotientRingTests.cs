using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Polynomials.PolynomialTestData;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

public class QuotientRingTests
{
    [Fact]
    public void Circle_relation_reduces_the_expanded_square_to_one()
    {
        // cos^2 + sin^2 = 1 (common practice): (c + s)^2 - 2cs = c^2 + s^2 = 1.
        var ring = new QuotientRing<Rational>(["c^2 + s^2 = 1"]);
        Assert.Equal(Polynomial<Rational>.One, ring.Reduce(Q("(c + s)^2 - 2 c s")));
        Assert.True(ring.Element("(c + s)^2 - 2 c s").IsOne);
        Assert.True(ring.AreEqual(Q("c^4"), Q("(1 - s^2)^2")));
    }

    [Fact]
    public void Inverse_declaration_cancels_a_symbol_against_its_inverse()
    {
        // t * t^-1 = 1 (common practice): t^3 tinv^2 = t.
        var ring = new QuotientRing<Rational>(Array.Empty<Polynomial<Rational>>(), inverses: [(S("t"), S("tinv"))]);
        Assert.Equal(Q("t"), ring.Reduce(Q("t^3 tinv^2")));
        Assert.Equal(Q("tinv"), ring.Reduce(Q("t tinv^2")));
        Assert.Equal(Q("t tinv - 1"), ring.Relations.Single());
    }

    [Fact]
    public void Inconsistent_relations_are_rejected_and_listed()
    {
        // x = 1 and x = 2 give 1 = 0 (common practice).
        var error = Assert.Throws<ExactArgumentException>(() => new QuotientRing<Rational>(["x = 1", "x = 2"]));
        Assert.Contains("inconsistent", error.Message, StringComparison.Ordinal);
        Assert.Contains("x - 1 = 0", error.Message, StringComparison.Ordinal);
        Assert.Contains("x - 2 = 0", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Ideal_membership_is_decided_by_the_normal_form()
    {
        // Cox, Little & O'Shea (4th ed.), Section 2.6, Example 3 (from memory): for I = <xz - y^2, x^3 - z^2> under grlex
        // (x > y > z), -4x^2y^2z^2 + y^6 + 3z^5 lies in I and xy - 5z^2 + x does not.
        var order = new MonomialOrder(MonomialOrderKind.GradedLexicographic, [S("x"), S("y"), S("z")]);
        var ring = new QuotientRing<Rational>(["x z - y^2", "x^3 - z^2"], order: order);
        Assert.True(ring.Contains(Q("-4 x^2 y^2 z^2 + y^6 + 3 z^5")));
        Assert.False(ring.Contains(Q("x y - 5 z^2 + x")));
    }

    [Fact]
    public void Sphere_relation_keeps_the_radius_squared_as_a_sum()
    {
        var ring = new QuotientRing<Rational>(["r^2 = x^2 + y^2 + z^2"]);
        Assert.True(ring.AreEqual(Q("r^4"), Q("(x^2 + y^2 + z^2)^2")));
        Assert.False(ring.Contains(Q("r - x")));
    }

    [Fact]
    public void Equation_errors_point_into_the_equation()
    {
        var twice = Assert.Throws<ExactParseException>(() => QuotientRing<Rational>.ParseEquation("x = y = 1"));
        Assert.Equal(6, twice.Position);
        var right = Assert.Throws<ExactParseException>(() => QuotientRing<Rational>.ParseEquation("x^2 = y^"));
        Assert.Equal(8, right.Position);
        Assert.Equal("x^2 = y^", right.Input);
        var empty = Assert.Throws<ExactParseException>(() => QuotientRing<Rational>.ParseEquation("x = "));
        Assert.Equal(4, empty.Position);
        Assert.Equal(Q("x - y - 1"), QuotientRing<Rational>.ParseEquation("x = y + 1"));
    }

    [Fact]
    public void Constants_without_a_ring_combine_with_any_ring()
    {
        var ring = new QuotientRing<Rational>(["c^2 + s^2 = 1"]);
        var c = ring.Element("c");
        var one = QuotientElement<Rational>.One;
        Assert.Null(one.Ring);
        Assert.Same(ring, (c + one).Ring);
        Assert.Equal(ring.Element("c + 1"), c + one);
        Assert.Equal(ring.Element("1 - s^2"), c * c);
        Assert.True((c * QuotientElement<Rational>.Zero).IsZero);
        Assert.Equal(ring.Element("2"), QuotientElement<Rational>.FromInteger(2));
        Assert.Equal(ring.Element("1/2 c"), c.Scale(new Rational(1, 2)));
        Assert.True(default(QuotientElement<Rational>).IsZero);
    }

    [Fact]
    public void Elements_of_different_rings_cannot_be_combined()
    {
        var first = new QuotientRing<Rational>(["c^2 + s^2 = 1"]);
        var second = new QuotientRing<Rational>(["c^2 = s"]);
        var a = first.Element("c");
        var b = second.Element("c");
        var error = Assert.Throws<ExactArgumentException>(() => a * b);
        Assert.Contains("c^2 + s^2 - 1", error.Message, StringComparison.Ordinal);
        Assert.Contains("different quotient rings", error.Message, StringComparison.Ordinal);
        Assert.Throws<ExactArgumentException>(() => a + b);
        Assert.False(a.Equals(b));
    }

    [Fact]
    public void Element_power_reduces_along_the_way()
    {
        // i^2 = -1 written as a relation j^2 = -1 over the rationals (common practice): j^7 = -j.
        var ring = new QuotientRing<Rational>(["j^2 = -1"]);
        Assert.Equal(ring.Element("-j"), ring.Element("j").Pow(7));
        Assert.Equal(ring.Element("1"), ring.Element("j").Pow(0));
    }

    [Fact]
    public void Conjugation_is_refused_when_the_relations_are_not_closed_under_it()
    {
        var real = new QuotientRing<GaussianRational>(["u^2 + 1"]);
        Assert.Equal(real.Element("-i u"), real.Element("i u").Conjugate());
        var complex = new QuotientRing<GaussianRational>(["u = i"]);
        Assert.Throws<ExactArgumentException>(() => complex.Element("u").Conjugate());
    }

    [Fact]
    public void No_relations_leave_polynomials_unchanged()
    {
        var ring = new QuotientRing<Rational>(Array.Empty<string>());
        Assert.Empty(ring.GroebnerBasis);
        Assert.Equal(Q("x^2 + y"), ring.Reduce(Q("x^2 + y")));
    }
}
