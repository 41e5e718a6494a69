using System.Xml.Linq;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Display.Tests.Lie;

[Collection(RegistryCollection.Name)]
public class RepresentationDisplayTests
{
    [Fact]
    public void G2_root_system_matches_approved_outputs()
    {
        // G2: dimension 14, 6 positive roots, Coxeter number 6, exponents 1, 5, |W| = 12, highest root 3α1 + 2α2
        // (Bourbaki, Lie Groups and Lie Algebras, ch. VI, plate IX); dual Coxeter number 4 (Kac, Infinite dimensional
        // Lie algebras, 6.1; from memory).
        var g2 = RootSystem.Of("G2");
        Approvals.VerifyAllFormats("Roots_root_system_G2", g2);
        var text = MathDisplay.ToPlainText(g2);
        Assert.Contains("dimension = 14, positive roots = 6", text);
        Assert.Contains("Coxeter number = 6, dual Coxeter number = 4, exponents = 1, 5, Weyl group order, |W| = 12, highest root = 3*alpha_1 + 2*alpha_2", text);
    }

    [Fact]
    public void Adjoint_of_A2_matches_approved_outputs()
    {
        // su(3) adjoint 8 = (1, 1): dominant weights (1, 1) once and (0, 0) twice, real, C2 = 3 (the dual Coxeter number),
        // index N = 3 in the physics convention (Slansky, Phys. Rep. 79 (1981), table 20 gives index 6 = 2 x 3 in Dynkin's).
        var adjoint = IrreducibleRepresentation.Of("A2", 1, 1);
        Approvals.VerifyAllFormats("Roots_irreducible_A2_adjoint", adjoint);
        var text = MathDisplay.ToPlainText(adjoint);
        Assert.Contains("dimension = 8, dominant weights = [[weight, multiplicity], [(1, 1), 1], [(0, 0), 2]], real, congruence class = root lattice, C_2 = 3", text);
        Assert.Contains("Dynkin index = 3", text);
        // The cubic Casimir vanishes on the self-conjugate adjoint (odd invariant; common practice).
        Assert.Contains("higher Casimirs = C_3 = 0, C_k = P_k(lambda + rho) - P_k(rho), P_k sums (mu, x)^k over the weights mu of the 3 = (1, 0)", text);
    }

    [Fact]
    public void Half_spin_card_of_D4_shows_the_Pfaffian_Casimir()
    {
        // V(omega_4) of so(8): omega_4 + rho = (7/2, 5/2, 3/2, 1/2) in Bourbaki's orthonormal coordinates (Plate IV), so
        // Pf = 105/16, computed by hand; the other half-spin gives -105/16 (sign change under the node 3-4 exchange).
        var spinor = IrreducibleRepresentation.Of("D4", 0, 0, 0, 1);
        Approvals.VerifyAllFormats("Roots_irreducible_D4_half_spin", spinor);
        var text = MathDisplay.ToPlainText(spinor);
        Assert.Contains("Pfaffian Casimir (degree 4) = Pf(lambda + rho) = 105/16", text);
        Assert.Contains("Pfaffian Casimir (degree 4) = Pf(lambda + rho) = -105/16", MathDisplay.ToPlainText(IrreducibleRepresentation.Of("D4", 0, 0, 1, 0)));
        // so(10) has no Pfaffian among the power sums of its vector but a degree-5 one here; omega_5 + rho gives 945/32 (by hand).
        Assert.Contains("Pfaffian Casimir (degree 5) = Pf(lambda + rho) = 945/32", MathDisplay.ToPlainText(IrreducibleRepresentation.Of("D5", 0, 0, 0, 0, 1)));
        Assert.DoesNotContain("Pfaffian", MathDisplay.ToPlainText(IrreducibleRepresentation.Of("B4", 0, 0, 0, 1)));
    }

    [Fact]
    public void Card_of_the_su3_triplet_shows_its_cubic_Casimir()
    {
        // su(3) on (p, q): C3 proportional to (p - q)(2p + q + 3)(p + 2q + 3) (common practice, from memory); with the 3 as
        // reference the constant is 1/9, so the 3 = (1, 0) gives 20/9.
        var text = MathDisplay.ToPlainText(IrreducibleRepresentation.Of("A2", 1, 0));
        Assert.Contains("higher Casimirs = C_3 = 20/9", text);
    }

    [Fact]
    public void Octet_times_octet_matches_approved_outputs()
    {
        // 8 x 8 = 1 + 8 + 8 + 10 + 10bar + 27 (Slansky, Phys. Rep. 79 (1981), table 22).
        var product = TensorProduct.Decompose(IrreducibleRepresentation.Of("A2", 1, 1), IrreducibleRepresentation.Of("A2", 1, 1));
        Approvals.VerifyAllFormats("Roots_tensor_product_8x8", product);
        Assert.Equal("1 + 2*8 + 10 + 10bar + 27, dimension = 64", MathDisplay.ToPlainText(product));
        Assert.Contains(@"\overline{10}", MathDisplay.ToLatex(product));
        var document = XDocument.Parse(MathDisplay.ToMathML(product));
        Assert.Contains(document.Descendants(), e => e.Name.LocalName == "mover");
    }

    [Fact]
    public void Representation_table_of_A2_lists_primed_and_barred_names()
    {
        // su(3) irreducibles up to dimension 15: 1, 3, 3bar, 6, 6bar, 8, 10, 10bar, 15, 15bar, 15', 15'bar
        // (Slansky, Phys. Rep. 79 (1981), table 22; names by this project's stated rule).
        var table = RepresentationTable.UpToDimension(RootSystem.Of("A2"), 15);
        var text = MathDisplay.ToPlainText(table);
        Assert.StartsWith("[[name, highest weight, dimension, reality, congruence class, Casimir (physics), index (physics)], [1, (0, 0), 1, real, root lattice, 0, 0]", text);
        Assert.Contains("[15'bar, ", text);
        Assert.Contains(@"\overline{15'}", MathDisplay.ToLatex(table));
        XDocument.Parse(MathDisplay.ToMathML(table));
        Assert.Equal(12, table.Count);
        Assert.EndsWith("[8, (1, 1), 8, real, root lattice, 3, 3]]", MathDisplay.ToPlainText(table.Single(r => r.Name == "8")));
        // Fundamental: C2 = (N^2 - 1)/(2N) = 4/3, physics index 1/2 (Slansky table 22 lists Dynkin index 1); the 15' = (4, 0)
        // has Dynkin index 35, so 35/2 here (same table).
        Assert.True(text.Contains("[3, (1, 0), 3, complex, ") && text.Contains(", 4/3, 1/2], [3bar, (0, 1)"), text);
        Assert.True(text.Contains("[15', (4, 0), 15, complex, ") && text.Contains(", 28/3, 35/2], [15'bar, (0, 4)"), text);
    }

    [Fact]
    public void Table_and_charged_branching_match_approved_outputs()
    {
        // su(3) irreducibles up to dimension 8: 1, 3, 3bar, 6, 6bar, 8 (Slansky, Phys. Rep. 79 (1981), table 22).
        Approvals.VerifyAllFormats("Roots_table_A2_up_to_8", RepresentationTable.UpToDimension(RootSystem.Of("A2"), 8));
        // SU(5) -> SU(3) x SU(2) x U(1): 5 = (3, 1) + (1, 2), charges in the ratio 2 : -3 like the hypercharges
        // -1/3 and 1/2 up to sign and scale (Slansky, Phys. Rep. 79 (1981), section 7; from memory).
        var rule = BranchingRule.ToLevi(RootSystem.Of("A4"), 3);
        Approvals.VerifyAllFormats("Roots_charged_branching_A4_five", rule.RestrictWithCharges(IrreducibleRepresentation.Of("A4", 1, 0, 0, 0)));
    }

    [Fact]
    public void Semisimple_names_and_charged_branching_terms_render()
    {
        // SU(5) -> SU(3) x SU(2) x U(1): 5 = (3, 1) + (1, 2) (Slansky, Phys. Rep. 79 (1981), table 30 and section 7).
        var rule = BranchingRule.ToLevi(RootSystem.Of("A4"), 3);
        var five = IrreducibleRepresentation.Of("A4", 1, 0, 0, 0);
        var sum = MathDisplay.ToPlainText(rule.Restrict(five));
        Assert.Contains("(3, 1)", sum);
        Assert.Contains("(1, 2)", sum);
        Assert.EndsWith("dimension = 5", sum);
        var charged = MathDisplay.ToPlainText(rule.RestrictWithCharges(five));
        Assert.Contains("(3, 1)_", charged);
        Assert.Contains("(1, 2)_", charged);
        XDocument.Parse(MathDisplay.ToMathML(rule.RestrictWithCharges(five)));
    }
}
