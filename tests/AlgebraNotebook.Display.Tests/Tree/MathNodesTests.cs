using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tests.Tree;

public class MathNodesTests
{
    private static readonly MathNode X = MathNodes.Symbol("x");
    private static readonly MathNode Y = MathNodes.Symbol("y");

    [Fact]
    public void Product_moves_signs_to_the_front_and_drops_ones()
    {
        // (-2) * 1 * x * (-y) = 2 x y: common practice.
        var product = MathNodes.Product(MathNodes.Integer(-2), MathNodes.One, X, MathNodes.Negate(Y));
        Assert.Equal("2*x*y", MathDisplay.ToPlainText(product));
        var negative = MathNodes.Product(MathNodes.Integer(-2), X);
        Assert.Equal("-2*x", MathDisplay.ToPlainText(negative));
        Assert.Equal(MathNodes.One, MathNodes.Product());
    }

    [Fact]
    public void Product_parenthesises_sums_and_sum_parenthesises_subtracted_sums()
    {
        // Parentheses around a sum used as a factor or subtracted: common practice.
        var sum = MathNodes.Sum(X, MathNodes.Negate(Y));
        Assert.Equal("2*(x - y)", MathDisplay.ToPlainText(MathNodes.Product(MathNodes.Integer(2), sum)));
        Assert.Equal("x - (x - y)", MathDisplay.ToPlainText(MathNodes.Sum(new SumTerm(false, X), new SumTerm(true, sum))));
        Assert.Equal("x + x - y", MathDisplay.ToPlainText(MathNodes.Sum(X, sum)));
    }

    [Fact]
    public void Negation_is_an_involution_and_zero_stays_zero()
    {
        // -(-x) = x, -0 = 0: common practice.
        Assert.Equal(X, MathNodes.Negate(MathNodes.Negate(X)));
        Assert.Equal(MathNodes.Zero, MathNodes.Negate(MathNodes.Zero));
        Assert.Equal("-x + y", MathDisplay.ToPlainText(MathNodes.Negate(MathNodes.Sum(X, MathNodes.Negate(Y)))));
    }

    [Fact]
    public void Compound_power_bases_get_parentheses()
    {
        // (x + y)^2 and (1/2)^3: common practice.
        Assert.Equal("(x + y)^2", MathDisplay.ToPlainText(MathNodes.Power(MathNodes.Sum(X, Y), 2)));
        var half = MathNodes.Fraction(MathNodes.One, MathNodes.Integer(2));
        Assert.Equal("(1/2)^3", MathDisplay.ToPlainText(MathNodes.Power(half, 3)));
        Assert.Equal(@"\left(\frac{1}{2}\right)^{3}", MathDisplay.ToLatex(MathNodes.Power(half, 3)));
        Assert.Equal("x^(-1)", MathDisplay.ToPlainText(MathNodes.Power(X, -1)));
    }

    [Fact]
    public void Fences_stretch_only_around_tall_content()
    {
        // MathML Core operator stretching (W3C MathML Core, operator stretching; from memory): stretchy stated explicitly on each fence.
        var shortFence = MathNodes.Fenced(MathNodes.Sum(X, Y));
        var tallFence = MathNodes.Fenced(MathNodes.Sum(X, MathNodes.Fraction(MathNodes.One, MathNodes.Integer(2))));
        Assert.Contains("<mo stretchy=\"false\">(</mo>", MathDisplay.ToMathML(shortFence));
        Assert.Contains("<mo stretchy=\"true\">(</mo>", MathDisplay.ToMathML(tallFence));
        Assert.Equal(@"\left(x + \frac{1}{2}\right)", MathDisplay.ToLatex(tallFence));
    }

    [Fact]
    public void Product_shows_a_dot_before_a_factor_that_starts_with_a_number()
    {
        // Juxtaposed numbers would merge (2 3 reads as 23; 2 1/2 as a mixed number): common practice.
        var product = new ProductNode([MathNodes.Integer(2), MathNodes.Integer(3), X, MathNodes.Fraction(MathNodes.One, MathNodes.Integer(2))]);
        Assert.Equal(@"2 \cdot 3 x \cdot \frac{1}{2}", MathDisplay.ToLatex(product));
        Assert.Equal("2*3*x*1/2", MathDisplay.ToPlainText(product));
        Assert.Contains("<mn>2</mn><mo>\u22C5</mo><mn>3</mn><mo>&#x2062;</mo><mi>x</mi><mo>\u22C5</mo><mfrac>", MathDisplay.ToMathML(product));
    }

    [Fact]
    public void Invalid_nodes_are_rejected_with_a_message_naming_the_problem()
    {
        var negative = Assert.Throws<ExactArgumentException>(() => new NumberNode(-5));
        Assert.Contains("-5", negative.Message);
        Assert.Throws<ExactArgumentException>(() => new ProductNode([X]));
        var ragged = Assert.Throws<ExactArgumentException>(() => new MatrixNode([[X, Y], [X]]));
        Assert.Contains("Row 1", ragged.Message);
        Assert.Throws<ExactArgumentException>(() => new SumNode([]));
    }

    [Fact]
    public void Nodes_with_lists_compare_structurally()
    {
        Assert.Equal(MathNodes.Sum(X, Y), MathNodes.Sum(X, Y));
        Assert.Equal(new MatrixNode([[X, Y]]), new MatrixNode([[X, Y]]));
        Assert.NotEqual(new MatrixNode([[X, Y]]), new MatrixNode([[X, Y]], FenceKind.Brackets));
    }
}
