using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class LeviChargeTests
{
    // E6 > so(10) x u(1): 27 = 1(4) + 10(-2) + 16(1) in Slansky's normalisation (Slansky 1981, E6 branching table);
    // our charges are proportional: ratios 4 : -2 : 1.
    [Fact]
    public void E6_27_charges_are_in_ratio_4_to_minus_2_to_1()
    {
        var terms = BranchingRule.ToLevi(RootSystem.Of("E6"), 1).RestrictWithCharges(Irrep("E6", 1, 0, 0, 0, 0, 0));
        var singlet = terms.Single(t => t.Irreducible.Dimension == 1).Charges[0];
        var vector = terms.Single(t => t.Irreducible.Dimension == 10).Charges[0];
        var spinor = terms.Single(t => t.Irreducible.Dimension == 16).Charges[0];
        Assert.Equal(new Rational(-2), vector / spinor);
        Assert.Equal(new Rational(4), singlet / spinor);
    }

    // su(5) > su(3) x su(2) x u(1): 5 = (3, 1) + (1, 2) with hypercharges in ratio -1/3 : 1/2 (common practice).
    [Fact]
    public void Su5_fundamental_hypercharge_ratio()
    {
        var terms = BranchingRule.ToLevi(RootSystem.Of("A4"), 3).RestrictWithCharges(Irrep("A4", 1, 0, 0, 0));
        var triplet = terms.Single(t => t.Irreducible.Dimension == 3).Charges[0];
        var doublet = terms.Single(t => t.Irreducible.Dimension == 2).Charges[0];
        Assert.Equal(new Rational(-2, 3), triplet / doublet);
    }

    // Property: charges are traceless (a Cartan element of a semisimple algebra has trace 0) and dimensions add up.
    [Fact]
    public void Charges_are_traceless_and_dimension_is_conserved()
    {
        var v = Irrep("B3", 1, 0, 1);
        var terms = BranchingRule.ToLevi(v.System, 1, 3).RestrictWithCharges(v);
        for (var c = 0; c < 2; c++)
        {
            Assert.Equal(Rational.Zero, terms.Aggregate(Rational.Zero, (s, t) => s + t.Charges[c] * t.Irreducible.Dimension * t.Multiplicity));
        }

        Assert.Equal(v.Dimension, terms.Aggregate(System.Numerics.BigInteger.Zero, (s, t) => s + t.Irreducible.Dimension * t.Multiplicity));
    }

    [Fact]
    public void Charges_need_a_Levi_rule()
    {
        var rule = BranchingRule.FromProjection(RootSystem.Of("A2"), RootSystem.Of("A1"), new[,] { { 2, 2 } });
        Assert.False(rule.HasCharges);
        Assert.Throws<ExactArgumentException>(() => rule.RestrictWithCharges(Irrep("A2", 1, 0)));
    }
}
