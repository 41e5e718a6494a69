using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Display.Tests;

public class SymbolNamesTests
{
    [Theory]
    [InlineData("J_x", "J", "x")]
    [InlineData("x_12", "x", "12")]
    [InlineData("t1", "t", "1")]
    [InlineData("omega12", "omega", "12")]
    [InlineData("alpha", "alpha", null)]
    [InlineData("x", "x", null)]
    [InlineData("x_", "x_", null)]
    [InlineData("a_b_c", "a", "b_c")]
    public void Split_follows_the_documented_convention(string name, string expectedBase, string? expectedSubscript)
    {
        // The convention documented on SymbolNames (our own, modelled on LaTeX's subscript underscore: common practice).
        Assert.Equal((expectedBase, expectedSubscript), SymbolNames.Split(name));
    }

    [Theory]
    [InlineData("alpha", "<mi>α</mi>", @"\alpha")]
    [InlineData("Omega", "<mi mathvariant=\"normal\">Ω</mi>", @"\Omega")]
    [InlineData("hbar", "<mi>ℏ</mi>", @"\hbar")]
    [InlineData("J_x", "<msub><mi>J</mi><mi>x</mi></msub>", "J_{x}")]
    [InlineData("x_12", "<msub><mi>x</mi><mn>12</mn></msub>", "x_{12}")]
    [InlineData("t1", "<msub><mi>t</mi><mn>1</mn></msub>", "t_{1}")]
    [InlineData("theta_1", "<msub><mi>θ</mi><mn>1</mn></msub>", @"\theta_{1}")]
    [InlineData("J_alpha", "<msub><mi>J</mi><mi>α</mi></msub>", @"J_{\alpha}")]
    [InlineData("mass", "<mi>mass</mi>", @"\mathrm{mass}")]
    [InlineData("λ", "<mi>λ</mi>", @"\lambda")]
    public void Symbol_names_map_to_typeset_glyphs(string name, string mathmlBody, string latex)
    {
        // Greek letters and ℏ: Unicode code charts (Greek and Coptic U+0370-03FF; U+210F PLANCK CONSTANT OVER TWO PI)
        // and the LaTeX symbol list (The Comprehensive LaTeX Symbol List, tables of greek letters); capitals upright as in plain TeX: from memory.
        // Identifier nodes go through the same naming convention as symbols.
        var symbol = AlgebraNotebook.Display.Tree.MathNodes.Symbol(name);
        Assert.Equal($"<math display=\"block\" xmlns=\"http://www.w3.org/1998/Math/MathML\">{mathmlBody}</math>", MathDisplay.ToMathML(symbol));
        Assert.Equal(latex, MathDisplay.ToLatex(symbol));
        Assert.Equal(name, MathDisplay.ToPlainText(symbol));
    }

    [Fact]
    public void Power_of_a_subscripted_name_stacks_the_exponent_over_the_subscript()
    {
        // x_1^2 sets both scripts on the base (common practice; MathML Core msubsup).
        var power = AlgebraNotebook.Display.Tree.MathNodes.Power(AlgebraNotebook.Display.Tree.MathNodes.Symbol("omega12"), 2);
        Assert.Contains("<msubsup><mi>ω</mi><mn>12</mn><mn>2</mn></msubsup>", MathDisplay.ToMathML(power));
        Assert.Equal(@"\omega_{12}^{2}", MathDisplay.ToLatex(power));
        Assert.Equal("omega12^2", MathDisplay.ToPlainText(power));
    }

    [Fact]
    public void Every_lower_case_greek_name_has_a_glyph_in_the_greek_block()
    {
        // The 24 letter names of the Greek alphabet: common practice.
        string[] names = ["alpha", "beta", "gamma", "delta", "epsilon", "zeta", "eta", "theta", "iota", "kappa", "lambda", "mu",
            "nu", "xi", "omicron", "pi", "rho", "sigma", "tau", "upsilon", "phi", "chi", "psi", "omega"];
        foreach (var name in names)
        {
            Assert.True(SymbolNames.TryGetGlyph(name, out var glyph, out _, out var upright), name);
            Assert.InRange(glyph[0], '\u0370', '\u03FF');
            Assert.False(upright, name);
            var capital = char.ToUpperInvariant(name[0]) + name[1..];
            Assert.True(SymbolNames.TryGetGlyph(capital, out var capitalGlyph, out _, out var capitalUpright), capital);
            Assert.InRange(capitalGlyph[0], '\u0391', '\u03A9');
            Assert.True(capitalUpright, capital);
        }
    }

    [Fact]
    public void Monomial_shows_powers_and_juxtaposition()
    {
        // x^2 y as msup and juxtaposition with invisible times U+2062 (Unicode U+2062 INVISIBLE TIMES; common practice in MathML).
        var monomial = Monomial.FromFactors([(Symbol.Of("ma"), 2), (Symbol.Of("mb"), 1)]);
        Assert.Equal("ma^2*mb", MathDisplay.ToPlainText(monomial));
        Assert.Equal(@"\mathrm{ma}^{2} \mathrm{mb}", MathDisplay.ToLatex(monomial));
        Assert.Contains("<msup><mi>ma</mi><mn>2</mn></msup><mo>&#x2062;</mo><mi>mb</mi>", MathDisplay.ToMathML(monomial));
        Assert.Equal("1", MathDisplay.ToPlainText(Monomial.One));
    }
}
