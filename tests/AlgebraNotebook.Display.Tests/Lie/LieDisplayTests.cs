using AlgebraNotebook.Display.Lie;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;

namespace AlgebraNotebook.Display.Tests.Lie;

[Collection(RegistryCollection.Name)]
public class LieDisplayTests
{
    [Fact]
    public void Truncated_BCH_series_reads_as_nested_commutators_with_an_order_term()
    {
        // Textbook bracket notation [A, B] (common practice); values from Casas and Murua 2009 (REFERENCES.md).
        var z = BakerCampbellHausdorff.Series(3);
        Assert.Equal("X + Y + 1/2*[X, Y] + 1/12*[X, [X, Y]] + 1/12*[[X, Y], Y] + O(degree 4)", MathDisplay.ToPlainText(z));
        var latex = MathDisplay.ToLatex(z);
        Assert.Contains(@"\frac{1}{12}", latex);
        Assert.Contains("[", latex);
        var mathml = MathDisplay.ToMathML(z);
        Assert.StartsWith("<math display=\"block\"", mathml);
        Assert.Contains("<mi>X</mi>", mathml);
    }

    [Fact]
    public void Negative_coefficients_and_exact_zero_are_shown_plainly()
    {
        var algebra = new FreeLieAlgebra("X", "Y");
        Assert.Equal("-[[X, Y], Y]", MathDisplay.ToPlainText(algebra.Parse("[Y, [X, Y]]")));
        Assert.Equal("0", MathDisplay.ToPlainText(algebra.Zero));
    }

    [Fact]
    public void Bracket_trees_and_Zassenhaus_exponents_are_renderable()
    {
        Assert.Equal("[X, [X, Y]]", MathDisplay.ToPlainText(BracketTree.Parse("[X,[X,Y]]")));
        var text = MathDisplay.ToPlainText(Zassenhaus.Compute(3));
        Assert.Contains("-1/2*[X, Y]", text);
        Assert.True(MathDisplay.CanRender(Zassenhaus.Compute(2)));
    }
}
