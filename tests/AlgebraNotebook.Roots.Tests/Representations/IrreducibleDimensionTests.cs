using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class IrreducibleDimensionTests
{
    // Dimensions from Slansky, Phys. Rep. 79 (1981), tables of irreducible representations (dimensions from memory;
    // label assignments in Bourbaki numbering recomputed here). Each is cross-checked by the Freudenthal character sum.
    [Theory]
    [InlineData("A2", new[] { 1, 1 }, 8)]
    [InlineData("A2", new[] { 3, 0 }, 10)]
    [InlineData("A2", new[] { 2, 2 }, 27)]
    [InlineData("D5", new[] { 1, 0, 0, 0, 0 }, 10)]
    [InlineData("D5", new[] { 0, 0, 0, 1, 0 }, 16)]
    [InlineData("D5", new[] { 0, 1, 0, 0, 0 }, 45)]
    [InlineData("D5", new[] { 2, 0, 0, 0, 0 }, 54)]
    [InlineData("D5", new[] { 0, 0, 1, 0, 0 }, 120)]
    [InlineData("D5", new[] { 0, 0, 0, 2, 0 }, 126)]
    [InlineData("D5", new[] { 1, 0, 0, 0, 1 }, 144)]
    [InlineData("D5", new[] { 0, 0, 0, 1, 1 }, 210)]
    [InlineData("E6", new[] { 1, 0, 0, 0, 0, 0 }, 27)]
    [InlineData("E6", new[] { 0, 1, 0, 0, 0, 0 }, 78)]
    [InlineData("E6", new[] { 0, 0, 1, 0, 0, 0 }, 351)]
    [InlineData("E6", new[] { 2, 0, 0, 0, 0, 0 }, 351)]
    [InlineData("E6", new[] { 1, 0, 0, 0, 0, 1 }, 650)]
    [InlineData("E7", new[] { 0, 0, 0, 0, 0, 0, 1 }, 56)]
    [InlineData("E7", new[] { 1, 0, 0, 0, 0, 0, 0 }, 133)]
    [InlineData("E7", new[] { 0, 1, 0, 0, 0, 0, 0 }, 912)]
    [InlineData("E7", new[] { 0, 0, 0, 0, 0, 1, 0 }, 1539)]
    [InlineData("E8", new[] { 0, 0, 0, 0, 0, 0, 0, 1 }, 248)]
    [InlineData("E8", new[] { 1, 0, 0, 0, 0, 0, 0, 0 }, 3875)]
    [InlineData("E8", new[] { 0, 0, 0, 0, 0, 0, 0, 2 }, 27000)]
    [InlineData("E8", new[] { 0, 0, 0, 0, 0, 0, 1, 0 }, 30380)]
    [InlineData("E8", new[] { 0, 1, 0, 0, 0, 0, 0, 0 }, 147250)]
    [InlineData("F4", new[] { 0, 0, 0, 1 }, 26)]
    [InlineData("F4", new[] { 1, 0, 0, 0 }, 52)]
    [InlineData("F4", new[] { 0, 0, 1, 0 }, 273)]
    [InlineData("F4", new[] { 0, 0, 0, 2 }, 324)]
    [InlineData("F4", new[] { 1, 0, 0, 1 }, 1053)]
    [InlineData("F4", new[] { 2, 0, 0, 0 }, 1053)]
    [InlineData("G2", new[] { 1, 0 }, 7)]
    [InlineData("G2", new[] { 0, 1 }, 14)]
    [InlineData("G2", new[] { 2, 0 }, 27)]
    [InlineData("G2", new[] { 1, 1 }, 64)]
    [InlineData("G2", new[] { 3, 0 }, 77)]
    [InlineData("G2", new[] { 0, 2 }, 77)]
    public void Weyl_dimension_matches_Slansky_tables_and_the_Freudenthal_sum(string type, int[] labels, int expected)
    {
        var irrep = Irrep(type, labels);
        Assert.Equal(new BigInteger(expected), irrep.Dimension);
        Assert.True(irrep.VerifyCharacter(), $"{type} {irrep.HighestWeight}: Freudenthal sum differs from Weyl's formula");
    }

    // The adjoint representation has the highest root as highest weight and the algebra's dimension (common practice).
    [Theory]
    [InlineData("A1")]
    [InlineData("A4")]
    [InlineData("B3")]
    [InlineData("C4")]
    [InlineData("D4")]
    [InlineData("E6")]
    [InlineData("E7")]
    [InlineData("E8")]
    [InlineData("F4")]
    [InlineData("G2")]
    public void Adjoint_dimension_is_the_algebra_dimension(string type)
    {
        var system = RootSystem.Of(type);
        var adjoint = IrreducibleRepresentation.Of(system, system.HighestRoot.AsWeight);
        Assert.Equal(new BigInteger(system.Dimension), adjoint.Dimension);
    }

    // su(2): V(n) has dimension n + 1 (common practice); su(N) fundamental has dimension N.
    [Fact]
    public void Dimensions_of_su2_and_su_N_fundamentals_are_n_plus_1_and_N()
    {
        for (var n = 0; n < 30; n++)
        {
            Assert.Equal(new BigInteger(n + 1), Irrep("A1", n).Dimension);
        }

        for (var rank = 1; rank <= 12; rank++)
        {
            var labels = new int[rank];
            labels[0] = 1;
            Assert.Equal(new BigInteger(rank + 1), Irrep("A" + rank, labels).Dimension);
        }
    }

    // Weyl's formula for E8 with large labels stays exact and quick: the value for (k, ..., k) is
    // prod over positive roots of (k + 1) = (k + 1)^120 because <rho, beta^vee> divides out (common practice).
    [Fact]
    public void E8_dimension_with_all_labels_k_is_k_plus_1_to_the_120()
    {
        var labels = Enumerable.Repeat(99, 8).ToArray();
        Assert.Equal(BigInteger.Pow(100, 120), Irrep("E8", labels).Dimension);
    }

    // su(2) with the largest label: dimension n + 1 without overflow (common practice).
    [Fact]
    public void Largest_label_does_not_overflow()
    {
        Assert.Equal(new BigInteger(int.MaxValue) + 1, Irrep("A1", int.MaxValue).Dimension);
    }

    [Fact]
    public void Negative_labels_and_wrong_rank_are_rejected_with_the_input_named()
    {
        var negative = Assert.Throws<ExactArgumentException>(() => Irrep("A2", 1, -1));
        Assert.Contains("(1, -1)", negative.Message);
        Assert.Contains("label 2", negative.Message);
        var rank = Assert.Throws<ExactArgumentException>(() => Irrep("E8", 1, 0));
        Assert.Contains("rank 8", rank.Message);
    }
}
