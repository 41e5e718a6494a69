using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display.Tests.Rendering;

public class OverlineAndPartialRenderingTests
{
    [Fact]
    public void Overline_over_a_primed_dimension_renders_in_all_three_outputs()
    {
        // LaTeX \overline and the prime ' (Lamport, LaTeX: A Document Preparation System, 3.3; from memory);
        // MathML mover with an accent (W3C MathML Core, mover; from memory). Plain text keeps the name's spelling.
        var node = new OverlineNode(MathNodes.Row(MathNodes.Integer(351), MathNodes.Operator("′")));
        Assert.Equal(@"\overline{351'}", MathDisplay.ToLatex(node));
        Assert.Equal("351'bar", MathDisplay.ToPlainText(node));
        Assert.Contains("<mover accent=\"true\"><mrow><mn>351</mn><mo>′</mo></mrow><mo stretchy=\"true\">&#x203E;</mo></mover>", MathDisplay.ToMathML(node));
    }

    [Fact]
    public void Overline_over_a_sum_is_grouped_in_plain_text()
    {
        var node = new OverlineNode(MathNodes.Sum(MathNodes.Symbol("a"), MathNodes.Symbol("b")));
        Assert.Equal("(a + b)bar", MathDisplay.ToPlainText(node));
    }

    [Fact]
    public void Partial_derivative_squared_renders_as_partial_with_subscript_and_power()
    {
        // \partial_x^2 is the usual notation for the second partial derivative (common practice).
        var node = MathNodes.Power(new SubscriptNode(MathNodes.Operator("∂"), MathNodes.Symbol("x")), 2);
        Assert.Equal(@"\partial_{x}^{2}", MathDisplay.ToLatex(node));
        Assert.Equal("d_x^2", MathDisplay.ToPlainText(node));
        Assert.Contains("<msubsup><mo>∂</mo><mi>x</mi><mn>2</mn></msubsup>", MathDisplay.ToMathML(node));
    }
}
