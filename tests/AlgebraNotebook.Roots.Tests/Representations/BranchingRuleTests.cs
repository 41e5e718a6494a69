using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class BranchingRuleTests
{
    private static string Dimensions(RepresentationSum sum) =>
        string.Join(" ", sum.Terms.SelectMany(t => Enumerable.Repeat(t.Irreducible.Dimension.ToString(), (int)t.Multiplicity)));

    // Isospin: su(3) > su(2): 3 = 2 + 1, 8 = 1 + 2 + 2 + 3 (common practice).
    [Fact]
    public void Su3_to_isospin()
    {
        var rule = BranchingRule.ToLevi(RootSystem.Of("A2"), 2);
        Assert.Equal("A1", rule.Subalgebra.Type.ToString());
        Assert.Equal("1 2", Dimensions(rule.Restrict(Irrep("A2", 1, 0))));
        Assert.Equal("1 2 2 3", Dimensions(rule.Restrict(Irrep("A2", 1, 1))));
    }

    // Slansky 1981 branching tables: so(10) > su(5): 10 = 5 + 5bar, 16 = 1 + 5bar + 10,
    // 45 = 1 + 10 + 10bar + 24.
    [Fact]
    public void So10_to_su5()
    {
        var rule = BranchingRule.ToLevi(RootSystem.Of("D5"), 5);
        Assert.Equal("A4", rule.Subalgebra.Type.ToString());
        Assert.Equal("5 5bar", string.Join(" ", rule.Restrict(Irrep("D5", 1, 0, 0, 0, 0)).ExpandedNames));
        Assert.Equal("1 5bar 10", string.Join(" ", rule.Restrict(Irrep("D5", 0, 0, 0, 1, 0)).ExpandedNames));
        Assert.Equal("1 10 10bar 24", string.Join(" ", rule.Restrict(Irrep("D5", 0, 1, 0, 0, 0)).ExpandedNames));
    }

    // Slansky 1981: E6 > so(10) (x u(1)): 27 = 1 + 10 + 16, 78 = 1 + 16 + 16bar + 45.
    [Fact]
    public void E6_to_so10()
    {
        var rule = BranchingRule.ToLevi(RootSystem.Of("E6"), 1);
        Assert.Equal("D5", rule.Subalgebra.Type.ToString());
        Assert.Equal("1 10 16", Dimensions(rule.Restrict(Irrep("E6", 1, 0, 0, 0, 0, 0))));
        Assert.Equal("1 16 16 45", Dimensions(rule.Restrict(Irrep("E6", 0, 1, 0, 0, 0, 0))));
    }

    // su(5) > su(3) x su(2) (x u(1)), the standard-model subgroup: 5 = (3, 1) + (1, 2), 10 = (3, 1) + (3, 2) + (1, 1) up to
    // conjugation of the su(3) factor, 24 = (8, 1) + (1, 3) + (1, 1) + (3, 2) + (3bar, 2) (Slansky 1981 branching tables).
    [Fact]
    public void Su5_to_standard_model()
    {
        var rule = BranchingRule.ToLevi(RootSystem.Of("A4"), 3);
        Assert.Equal("A2+A1", rule.Subalgebra.Type.ToString());
        Assert.Equal(["(1, 2)", "(3, 1)"], rule.Restrict(Irrep("A4", 1, 0, 0, 0)).ExpandedNames);
        Assert.Equal(["(1, 1)", "(3bar, 1)", "(3, 2)"], rule.Restrict(Irrep("A4", 0, 1, 0, 0)).ExpandedNames);
        Assert.Equal(["(1, 1)", "(1, 3)", "(3, 2)", "(3bar, 2)", "(8, 1)"], rule.Restrict(Irrep("A4", 1, 0, 0, 1)).ExpandedNames);
    }

    // E8 > E7 (x u(1)): 248 = 133 + 56 + 56 + 1 + 1 + 1 (common practice; E8 > E7 x su(2) gives (133,1) + (1,3) + (56,2)).
    [Fact]
    public void E8_to_E7()
    {
        var rule = BranchingRule.ToLevi(RootSystem.Of("E8"), 8);
        Assert.Equal("E7", rule.Subalgebra.Type.ToString());
        Assert.Equal("1 1 1 56 56 133", Dimensions(rule.Restrict(Irrep("E8", 0, 0, 0, 0, 0, 0, 0, 1))));
    }

    // Principal su(2) in su(3): the projection is lambda -> <lambda, 2 rho^vee> = 2 a1 + 2 a2; 3 stays irreducible (spin 1)
    // and 8 = 3 + 5 (common practice).
    [Fact]
    public void Principal_su2_of_su3_from_a_projection_matrix()
    {
        var rule = BranchingRule.FromProjection(RootSystem.Of("A2"), RootSystem.Of("A1"), new[,] { { 2, 2 } });
        Assert.Equal("3", Dimensions(rule.Restrict(Irrep("A2", 1, 0))));
        Assert.Equal("3 5", Dimensions(rule.Restrict(Irrep("A2", 1, 1))));
    }

    // Principal su(2) in G2 (through so(7)): the 7 stays irreducible and the 14 = 3 + 11 (common practice: exponents 1, 5).
    [Fact]
    public void Principal_su2_of_G2()
    {
        var g2 = RootSystem.Of("G2");
        var coefficients = new[] { Irrep("G2", 1, 0).PairingWithTwiceRhoCheck, Irrep("G2", 0, 1).PairingWithTwiceRhoCheck };
        var rule = BranchingRule.FromProjection(g2, RootSystem.Of("A1"), new[,] { { (int)coefficients[0], (int)coefficients[1] } });
        Assert.Equal("7", Dimensions(rule.Restrict(Irrep("G2", 1, 0))));
        Assert.Equal("3 11", Dimensions(rule.Restrict(Irrep("G2", 0, 1))));
    }

    [Fact]
    public void Invalid_projections_are_rejected_naming_the_problem()
    {
        var bad = BranchingRule.FromProjection(RootSystem.Of("A2"), RootSystem.Of("A1"), new[,] { { 1, 2 } });
        var error = Assert.Throws<ExactArgumentException>(() => bad.Restrict(Irrep("A2", 1, 0)));
        Assert.Contains("Weyl", error.Message);
        var shape = Assert.Throws<ExactArgumentException>(() =>
            BranchingRule.FromProjection(RootSystem.Of("A2"), RootSystem.Of("A1"), new[,] { { 1 }, { 0 } }));
        Assert.Contains("1x2", shape.Message);
        Assert.Throws<ExactArgumentException>(() => BranchingRule.ToLevi(RootSystem.Of("A2"), 3));
        Assert.Throws<ExactArgumentException>(() => BranchingRule.ToLevi(RootSystem.Of("A2"), 1, 2));
    }

    // Property: restriction to every Levi subalgebra conserves dimension.
    [Fact]
    public void Random_Levi_restrictions_conserve_dimension()
    {
        var random = new Random(9001);
        string[] types = ["B3", "C3", "D4", "F4", "G2", "A4", "E6"];
        for (var iteration = 0; iteration < 15 * Iterations; iteration++)
        {
            var system = RootSystem.Of(types[random.Next(types.Length)]);
            var node = random.Next(1, system.Rank + 1);
            var labels = Enumerable.Range(0, system.Rank).Select(_ => random.Next(2)).ToArray();
            var irrep = IrreducibleRepresentation.Of(system, labels);
            if (irrep.Dimension > 50_000)
            {
                continue;
            }

            var rule = BranchingRule.ToLevi(system, node);
            Assert.True(irrep.Dimension == rule.Restrict(irrep).Dimension, $"{rule} {irrep.HighestWeight}");
        }
    }
}
