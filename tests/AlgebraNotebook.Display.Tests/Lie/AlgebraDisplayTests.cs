using System.Xml.Linq;
using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Lie;

[Collection(RegistryCollection.Name)]
public class AlgebraDisplayTests
{
    [Fact]
    public void Sl2_card_matches_approved_outputs()
    {
        // sl(2): [H, E] = 2E, [H, F] = -2F, [E, F] = H (Humphreys, Introduction to Lie Algebras, 2.1 / 7.1).
        Approvals.VerifyAllFormats("Lie_algebra_sl2_card", LieAlgebras.SpecialLinear<Rational>(2));
    }

    [Fact]
    public void Sl2_summary_matches_approved_outputs()
    {
        // sl(2) is simple of type A1, dimension 3 (Humphreys, Introduction to Lie Algebras, 2.1).
        Approvals.VerifyAllFormats("Lie_algebra_sl2_summary", LieAlgebras.SpecialLinear<Rational>(2).Summary());
    }

    [Fact]
    public void Solvable_summary_names_the_radical_and_the_missing_levi_factor()
    {
        // Upper triangular 2x2 matrices (basis H = E_11, N = E_12, [H, N] = N): solvable, not nilpotent; nilradical
        // span{N} (common practice).
        var b = LieAlgebra<Rational>.FromCommutatorTable("[H, N] = N");
        var text = MathDisplay.ToPlainText(b.Summary());
        Assert.StartsWith("[[dimension, 2], [kind, solvable, not nilpotent], [centre dimension, 0], [derived algebra [g, g] dimension, 1]", text);
        Assert.Contains("[nilradical dimension, 1], [Levi factor dimension, 0]", text);
    }

    [Fact]
    public void Long_commutator_tables_are_capped_with_a_count_of_the_rest()
    {
        var sl4 = LieAlgebras.SpecialLinear<Rational>(4);
        var nonZero = 0;
        for (var i = 0; i < sl4.Dimension; i++)
        {
            for (var j = i + 1; j < sl4.Dimension; j++)
            {
                if (Enumerable.Range(0, sl4.Dimension).Any(k => !sl4.StructureConstant(i, j, k).IsZero))
                {
                    nonZero++;
                }
            }
        }

        Assert.True(nonZero > 40, $"sl(4) has only {nonZero} non-zero brackets");
        var text = MathDisplay.ToPlainText(sl4);
        Assert.EndsWith($"]], … {nonZero - 40} more non-zero brackets", text);
    }

    [Fact]
    public void Basis_names_with_markup_characters_are_escaped()
    {
        // XML 1.0 (Fifth Edition), section 2.4: & and < must be escaped in character data.
        var constants = new Rational[2, 2, 2];
        constants[0, 1, 1] = Rational.One;
        constants[1, 0, 1] = -Rational.One;
        var algebra = LieAlgebra<Rational>.FromStructureConstants(["a<b", "c&d"], constants, "names with markup");
        var document = XDocument.Parse(MathDisplay.ToMathML(algebra));
        Assert.Contains(document.Descendants(), e => e.Name.LocalName == "mi" && e.Value == "a<b");
        Assert.Contains(document.Descendants(), e => e.Name.LocalName == "mi" && e.Value == "c&d");
        Assert.DoesNotContain("c&d", MathDisplay.ToLatex(algebra));
    }

    [Fact]
    public void Label_text_is_escaped_and_the_MathML_is_well_formed()
    {
        var algebra = LieAlgebra<Rational>.FromStructureConstants(["X", "Y"], new Rational[2, 2, 2], "a < b & \"c\"");
        var mathml = MathDisplay.ToMathML(algebra);
        // Well-formedness: XML 1.0 section 2.4 (& and < escaped in character data); MathML namespace from W3C MathML Core (from memory).
        var document = XDocument.Parse(mathml);
        Assert.Equal("http://www.w3.org/1998/Math/MathML", document.Root!.Name.NamespaceName);
        Assert.Contains(document.Descendants(), e => e.Name.LocalName == "mtext" && e.Value == "a < b & \"c\"");
        Assert.Contains(@"\text{a < b \& ""c""}", MathDisplay.ToLatex(algebra).Replace("\\textless{}", "<"));
        Assert.EndsWith("all brackets vanish", MathDisplay.ToPlainText(algebra));
    }
}
