using System.Xml.Linq;
using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Display;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Lie;

public class EnvelopingDisplayTests
{
    [Fact]
    public void Quadratic_casimir_of_sl2_displays_as_a_pbw_sum()
    {
        // Killing-form Casimir of sl(2) in the PBW order H, E, F: (1/8)(H^2 + 4 E F - 2 H) (Humphreys, Introduction to
        // Lie Algebras, section 6.2, from memory; the enveloping-algebra tests derive it).
        var sl2 = LieAlgebra<Rational>.FromCommutatorTable("[H, E] = 2 E\n[H, F] = -2 F\n[E, F] = H", ["H", "E", "F"]);
        var casimir = CasimirElements.QuadraticCasimir(sl2);
        Assert.True(MathDisplay.CanRender(casimir));
        Assert.Equal("1/8*H^2 + 1/2*E*F - 1/4*H", MathDisplay.ToPlainText(casimir));
        Assert.Equal(@"\frac{1}{8} H^{2} + \frac{1}{2} E F - \frac{1}{4} H", MathDisplay.ToLatex(casimir));
        var math = XElement.Parse(MathDisplay.ToMathML(casimir));
        Assert.Equal("math", math.Name.LocalName);
    }
}

public class LieAlgebraReportDisplayTests
{
    [Fact]
    public void One_call_report_of_sl2_shows_killing_form_real_form_and_casimir()
    {
        // sl(2, R) with [H, E] = 2E, [H, F] = -2F, [E, F] = H: Killing form K(H,H) = 8, K(E,F) = 4 (Humphreys, Introduction
        // to Lie Algebras, section 5.1, from memory), signature (2, 1, 0), real form sl(2,R) (common practice).
        var sl2 = LieAlgebra<Rational>.FromCommutatorTable("[H, E] = 2 E\n[H, F] = -2 F\n[E, F] = H", ["H", "E", "F"]);
        var report = sl2.Describe();
        var plain = MathDisplay.ToPlainText(report);
        Assert.Contains("[Killing signature, (positive, negative, zero) = (2, 1, 0)]", plain);
        Assert.Contains("[[8, 0, 0], [0, 0, 4], [0, 4, 0]]", plain);
        Assert.Contains("sl(2,R)", plain);
        Assert.Contains("1/8*H^2 + 1/2*E*F - 1/4*H", plain);
        var math = System.Xml.Linq.XElement.Parse(MathDisplay.ToMathML(report));
        Assert.Equal("math", math.Name.LocalName);
    }
}
