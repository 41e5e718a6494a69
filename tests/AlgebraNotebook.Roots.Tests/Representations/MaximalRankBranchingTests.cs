using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class MaximalRankBranchingTests
{
    private static string Dimensions(RepresentationSum sum) =>
        string.Join(" ", sum.Terms.SelectMany(t => Enumerable.Repeat(t.Irreducible.Dimension.ToString(), (int)t.Multiplicity)));

    // E8 > E7 x su(2): 248 = (133, 1) + (1, 3) + (56, 2) (common practice; Slansky 1981 branching tables).
    [Fact]
    public void E8_to_E7_times_su2()
    {
        var rule = BranchingRule.ToMaximalRank(RootSystem.Of("E8"), 8);
        Assert.Equal("A1+E7", rule.Subalgebra.Type.ToString());
        Assert.Equal(["(3, 1)", "(2, 56)", "(1, 133)"], rule.Restrict(Irrep("E8", 0, 0, 0, 0, 0, 0, 0, 1)).ExpandedNames);
    }

    // E8 > su(9): 248 = 80 + 84 + 84bar; E8 > so(16): 248 = 120 + 128 (common practice; Slansky 1981).
    [Fact]
    public void E8_to_su9_and_so16()
    {
        var a8 = BranchingRule.ToMaximalRank(RootSystem.Of("E8"), 2);
        Assert.Equal("A8", a8.Subalgebra.Type.ToString());
        var adjointA8 = a8.Restrict(Irrep("E8", 0, 0, 0, 0, 0, 0, 0, 1));
        Assert.Equal("80 84 84", Dimensions(adjointA8));
        Assert.Contains("84bar", adjointA8.ExpandedNames);
        var d8 = BranchingRule.ToMaximalRank(RootSystem.Of("E8"), 1);
        Assert.Equal("D8", d8.Subalgebra.Type.ToString());
        Assert.Equal("120 128", Dimensions(d8.Restrict(Irrep("E8", 0, 0, 0, 0, 0, 0, 0, 1))));
    }

    // G2 > su(3): 7 = 1 + 3 + 3bar, 14 = 3 + 3bar + 8 (common practice). F4 > so(9): 26 = 1 + 9 + 16, 52 = 16 + 36.
    [Fact]
    public void G2_to_su3_and_F4_to_so9()
    {
        var g2 = BranchingRule.ToMaximalRank(RootSystem.Of("G2"), 1);
        Assert.Equal("A2", g2.Subalgebra.Type.ToString());
        Assert.Equal(["1", "3", "3bar"], g2.Restrict(Irrep("G2", 1, 0)).ExpandedNames);
        Assert.Equal(["3", "3bar", "8"], g2.Restrict(Irrep("G2", 0, 1)).ExpandedNames);
        var f4 = BranchingRule.ToMaximalRank(RootSystem.Of("F4"), 4);
        Assert.Equal("B4", f4.Subalgebra.Type.ToString());
        Assert.Equal("1 9 16", Dimensions(f4.Restrict(Irrep("F4", 0, 0, 0, 1))));
        Assert.Equal("16 36", Dimensions(f4.Restrict(Irrep("F4", 1, 0, 0, 0))));
    }

    // Property: every extended-diagram deletion conserves dimension on small irreducibles.
    [Theory]
    [InlineData("B4")]
    [InlineData("C4")]
    [InlineData("D5")]
    [InlineData("F4")]
    [InlineData("E6")]
    [InlineData("E7")]
    public void Every_deletion_conserves_dimension(string type)
    {
        var system = RootSystem.Of(type);
        for (var node = 1; node <= system.Rank; node++)
        {
            var rule = BranchingRule.ToMaximalRank(system, node);
            for (var i = 0; i < system.Rank; i++)
            {
                var labels = new int[system.Rank];
                labels[i] = 1;
                var irrep = IrreducibleRepresentation.Of(system, labels);
                if (irrep.Dimension > 30_000)
                {
                    continue;
                }

                Assert.True(irrep.Dimension == rule.Restrict(irrep).Dimension, $"{rule}: {irrep.HighestWeight}");
            }
        }
    }

    [Fact]
    public void Bad_nodes_and_semisimple_algebras_are_rejected()
    {
        Assert.Throws<ExactArgumentException>(() => BranchingRule.ToMaximalRank(RootSystem.Of("E8"), 0));
        Assert.Throws<ExactArgumentException>(() => BranchingRule.ToMaximalRank(RootSystem.Of("E8"), 9));
        Assert.Throws<ExactArgumentException>(() => BranchingRule.ToMaximalRank(RootSystem.Of("A2+A1"), 1));
    }
}
