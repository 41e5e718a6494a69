using AlgebraNotebook.Display.Tree;

namespace AlgebraNotebook.Display.Tests.Rendering;

public class LargeOutputTests
{
    private static MatrixNode Square(int size)
    {
        var entry = MathNodes.Negate(MathNodes.Fraction(MathNodes.One, MathNodes.Symbol("alpha_1")));
        var rows = new MathNode[size][];
        for (var r = 0; r < size; r++)
        {
            rows[r] = Enumerable.Repeat(entry, size).ToArray();
        }

        return new MatrixNode(rows);
    }

    [Theory]
    [InlineData("MathML")]
    [InlineData("LaTeX")]
    [InlineData("plain")]
    public void Output_size_grows_linearly_with_the_number_of_matrix_entries(string format)
    {
        // Doubling the side quadruples the entries; linear output means the size ratio is 4 up to the constant overhead.
        Func<object, string> render = format switch
        {
            "MathML" => MathDisplay.ToMathML,
            "LaTeX" => MathDisplay.ToLatex,
            _ => MathDisplay.ToPlainText,
        };
        var small = render(Square(60)).Length;
        var large = render(Square(120)).Length;
        var ratio = (double)large / small;
        Assert.True(ratio > 3.9 && ratio < 4.1, $"{format}: 60x60 gives {small} characters, 120x120 gives {large}; ratio {ratio:F3} is not about 4.");

        // And the size per entry is bounded by a small constant (one entry renders to well under 300 characters).
        Assert.True(large < 120 * 120 * 300, $"{format}: {large} characters for 14400 entries.");
    }
}
