using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Tests.FreeLie;

public class LieSeriesTests
{
    private static readonly FreeLieAlgebra XY = new("X", "Y");

    [Fact]
    public void Truncation_order_is_tracked_through_sums_and_brackets()
    {
        // A truncated series a + O(degree p) bracketed with b (lowest degree q) is known below p + q (common practice).
        var a = XY.Parse("X + [X, Y]").Truncate(3);
        var b = XY.Parse("Y");
        Assert.Equal(3, (a + b).Order);
        var bracket = LieSeries.Bracket(a, b);
        Assert.Equal(4, bracket.Order);
        Assert.Equal("[X, Y] + [[X, Y], Y] + O(degree 4)", bracket.ToString());
        Assert.Equal("O(degree 2)", XY.Zero.Truncate(2).ToString());
        Assert.Equal("0", XY.Zero.ToString());
    }

    [Fact]
    public void Terms_are_grouped_by_degree_then_by_Lyndon_word()
    {
        var s = XY.Parse("[[X, Y], Y] + Y + [X, [X, Y]] + X + 2 [X, Y]");
        Assert.Equal("X + Y + 2 [X, Y] + [X, [X, Y]] + [[X, Y], Y]", s.ToString());
        Assert.Equal(new[] { 1, 1, 2, 3, 3 }, s.Terms.Select(t => t.Word.Degree).ToArray());
        Assert.Equal(3, s.MaxDegree);
        Assert.Equal(1, s.MinDegree);
        Assert.Equal(new Rational(2), s.CoefficientOf("X", "Y"));
        Assert.Equal(Rational.Zero, s.CoefficientOf("X", "X", "X", "Y"));
    }

    [Fact]
    public void Unknown_coefficients_and_degrees_are_refused()
    {
        var s = XY.Parse("X + [X, Y]").Truncate(2);
        var e = Assert.Throws<ExactArgumentException>(() => s.CoefficientOf("X", "Y"));
        Assert.Contains("truncated at order 2", e.Message);
        Assert.Throws<ExactArgumentException>(() => s.DegreePart(2));
        Assert.Throws<ExactArgumentException>(() => s.DegreePart(0));
        Assert.Throws<ExactArgumentException>(() => s.Truncate(0));
        Assert.Throws<ExactArgumentException>(() => s.CoefficientOf("Y", "X"));
        Assert.Throws<ExactArgumentException>(() => s + new FreeLieAlgebra("A", "B").Generator("A"));
    }

    [Fact]
    public void Algebras_with_the_same_ordered_generators_are_interchangeable()
    {
        var other = new FreeLieAlgebra("X", "Y");
        Assert.Equal(XY, other);
        Assert.Equal(XY.Parse("[X, Y]"), other.Parse("[X, Y]"));
        // The order of the generators is part of the algebra: with Y < X the Lyndon word is YX.
        var reversed = new FreeLieAlgebra("Y", "X");
        Assert.NotEqual(XY, reversed);
        Assert.Equal("-[Y, X]", reversed.Parse("[X, Y]").ToString());
    }
}
