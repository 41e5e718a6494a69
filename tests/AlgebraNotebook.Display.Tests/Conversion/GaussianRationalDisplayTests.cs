using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Conversion;

public class GaussianRationalDisplayTests
{
    [Fact]
    public void Half_minus_three_fifths_i_matches_approved_outputs()
    {
        // Upright imaginary unit after its coefficient: ISO 80000-2, complex numbers (i set in roman type); from memory.
        Approvals.VerifyAllFormats("GaussianRational_half_minus_three_fifths_i", GaussianRational.Parse("1/2 - 3/5 i"));
    }

    [Theory]
    [InlineData("i", "i", @"\mathrm{i}")]
    [InlineData("-i", "-i", @"-\mathrm{i}")]
    [InlineData("2 + i", "2 + i", @"2 + \mathrm{i}")]
    [InlineData("-1 - i", "-1 - i", @"-1 - \mathrm{i}")]
    [InlineData("3/2 i", "3/2*i", @"\frac{3}{2} \mathrm{i}")]
    [InlineData("-2 i", "-2*i", @"-2 \mathrm{i}")]
    [InlineData("5", "5", "5")]
    [InlineData("0", "0", "0")]
    public void Gaussian_rationals_show_unit_coefficients_as_bare_i(string input, string plain, string latex)
    {
        // a + b i with b = ±1 written as ±i: common practice.
        var value = GaussianRational.Parse(input);
        Assert.Equal(plain, MathDisplay.ToPlainText(value));
        Assert.Equal(latex, MathDisplay.ToLatex(value));
    }

    [Fact]
    public void Imaginary_unit_is_upright_in_mathml()
    {
        // MathML Core: mathvariant="normal" is the only supported value and makes a single-letter <mi> upright (W3C MathML Core, the mathvariant attribute; from memory).
        Assert.Contains("<mi mathvariant=\"normal\">i</mi>", MathDisplay.ToMathML(GaussianRational.I));
    }
}
