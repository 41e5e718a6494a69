using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Tests.FreeLie;

public class LieExpressionParsingTests
{
    private static readonly FreeLieAlgebra Algebra = new("X", "Y");

    [Fact]
    public void Sums_with_rational_coefficients_are_parsed_and_written_back()
    {
        var element = Algebra.Parse("X + Y + 1/2 [X, Y] - 1/12*[Y,[X,Y]]");
        Assert.Equal("X + Y + 1/2 [X, Y] + 1/12 [[X, Y], Y]", element.ToString());
        Assert.Equal(new Rational(1, 12), element.CoefficientOf("X", "Y", "Y"));
        Assert.Equal(element, Algebra.Parse(element.ToString()));
    }

    [Fact]
    public void Brackets_of_sums_are_bilinear()
    {
        // Bilinearity (common practice): [X + Y, X - Y] = -2 [X, Y].
        Assert.Equal("-2 [X, Y]", Algebra.Parse("[X + Y, X - Y]").ToString());
        Assert.Equal("-[X, Y]", Algebra.Parse("-(X + [X, X]) + X - [Y, X] - 2 [X, Y]").ToString());
    }

    [Fact]
    public void Bracket_trees_round_trip_as_text()
    {
        var tree = BracketTree.Parse("[ X,[X ,Y]]");
        Assert.Equal("[X, [X, Y]]", tree.ToString());
        Assert.Equal(3, tree.Degree);
        Assert.Equal("[X, [X, Y]]", Algebra.Rewrite(tree).ToString());
    }

    [Theory]
    [InlineData("[X, Y", 5)]
    [InlineData("[X Y]", 3)]
    [InlineData("[X, Z]", 4)]
    [InlineData("", 0)]
    [InlineData("X + ", 4)]
    [InlineData("1/0 X", 0)]
    [InlineData("X Y", 2)]
    public void Malformed_text_names_the_offending_position(string text, int position)
    {
        var e = Assert.Throws<ExactParseException>(() => Algebra.Parse(text));
        Assert.Equal(position, e.Position);
    }

    [Fact]
    public void Unknown_generators_are_named()
    {
        var e = Assert.Throws<ExactParseException>(() => Algebra.Parse("[X, Z]"));
        Assert.Contains("unknown generator \"Z\"", e.Message);
        var f = Assert.Throws<ExactArgumentException>(() => Algebra.Rewrite(BracketTree.Parse("[X, W]")));
        Assert.Contains("\"W\"", f.Message);
        Assert.Throws<ExactParseException>(() => BracketTree.Parse("[X, [Y]]"));
        Assert.Throws<ExactParseException>(() => BracketTree.Parse("[X, Y]]"));
    }

    [Fact]
    public void Bad_generator_names_are_rejected()
    {
        Assert.Throws<ExactArgumentException>(() => new FreeLieAlgebra());
        Assert.Throws<ExactArgumentException>(() => new FreeLieAlgebra("X", "X"));
        Assert.Throws<ExactArgumentException>(() => new FreeLieAlgebra("X", "1Y"));
        Assert.Throws<ExactArgumentException>(() => new FreeLieAlgebra(Enumerable.Range(0, 17).Select(i => $"g{i}").ToArray()));
        var e = Assert.Throws<ExactArgumentException>(() => Algebra.Generator("Q"));
        Assert.Contains("Unknown generator \"Q\"", e.Message);
    }
}
