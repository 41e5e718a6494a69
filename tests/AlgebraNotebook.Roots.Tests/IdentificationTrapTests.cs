namespace AlgebraNotebook.Roots.Tests;

/// <summary>The identification trap listed in the reference notes: E6, B6 and C6 agree in many numbers.</summary>
public class IdentificationTrapTests
{
    [Fact]
    public void E6_B6_and_C6_share_dimension_rank_roots_and_Coxeter_number_but_not_exponents()
    {
        var e6 = RootSystem.Of("E6");
        var b6 = RootSystem.Of("B6");
        var c6 = RootSystem.Of("C6");
        foreach (var s in new[] { e6, b6, c6 })
        {
            // Humphreys, Reflection Groups, Table 3.1: dimension 78, rank 6, N = 36, h = 12.
            Assert.Equal(78, s.Dimension);
            Assert.Equal(6, s.Rank);
            Assert.Equal(36, s.NumberOfPositiveRoots);
            Assert.Equal(12, s.CoxeterNumber);
        }

        // Exponents differ: E6 1 4 5 7 8 11; B6 = C6 1 3 5 7 9 11 (Table 3.1).
        Assert.Equal(new[] { 1, 4, 5, 7, 8, 11 }, e6.Exponents);
        Assert.Equal(new[] { 1, 3, 5, 7, 9, 11 }, b6.Exponents);
        Assert.Equal(b6.Exponents, c6.Exponents);
        Assert.NotEqual(e6.Exponents, b6.Exponents);

        // B6 and C6 share the Weyl group but differ in root lengths: B6 has 6 short positive roots, C6 has 30 (common practice).
        Assert.Equal(b6.WeylGroup.Order, c6.WeylGroup.Order);
        Assert.Equal(6, b6.PositiveRoots.Count(r => !r.IsLong));
        Assert.Equal(30, c6.PositiveRoots.Count(r => !r.IsLong));
        Assert.True(e6.IsSimplyLaced);
        Assert.False(e6.Type.IsIsomorphicTo(b6.Type));
        Assert.False(b6.Type.IsIsomorphicTo(c6.Type));
    }
}
