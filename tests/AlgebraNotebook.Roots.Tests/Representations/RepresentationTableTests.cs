using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class RepresentationTableTests
{
    // Slansky 1981, tables of irreducibles (lists from memory): the smallest irreducibles by dimension.
    [Theory]
    [InlineData("A2", 27, "1 3 3bar 6 6bar 8 10 10bar 15 15bar 15' 15'bar 21 21bar 24 24bar 27")]
    [InlineData("G2", 77, "1 7 14 27 64 77 77'")]
    [InlineData("F4", 1053, "1 26 52 273 324 1053 1053'")]
    [InlineData("E6", 650, "1 27 27bar 78 351 351bar 351' 351'bar 650")]
    [InlineData("D5", 210, "1 10 16 16bar 45 54 120 126 126bar 144 144bar 210 210'")]
    [InlineData("E7", 1539, "1 56 133 912 1463 1539")]
    [InlineData("E8", 147250, "1 248 3875 27000 30380 147250")]
    public void Smallest_irreducibles_match_Slansky_tables(string type, int maximum, string expected)
    {
        var table = RepresentationTable.UpToDimension(RootSystem.Of(type), maximum);
        Assert.Equal(expected, string.Join(" ", table.Select(r => r.Name)));
        Assert.All(table, r => Assert.True(r.Irreducible.VerifyCharacter(), r.Name));
        Assert.True(table.Zip(table.Skip(1)).All(p => p.First.Dimension <= p.Second.Dimension));
    }

    [Fact]
    public void Rows_carry_reality_class_Casimir_and_index()
    {
        var table = RepresentationTable.UpToDimension(RootSystem.Of("A2"), 8);
        var three = table.Single(r => r.Name == "3");
        Assert.Equal(Reality.Complex, three.Reality);
        Assert.Equal(3, three.CongruenceClass.Order);
        Assert.Equal(new Rational(4, 3), three.Casimir);
        Assert.Equal(Rational.Half, three.DynkinIndex);
        Assert.Equal(new BigInteger(8), table.Single(r => r.Name == "8").Dimension);
    }

    [Fact]
    public void Bad_bounds_are_rejected()
    {
        Assert.Throws<ExactArgumentException>(() => RepresentationTable.UpToDimension(RootSystem.Of("A2"), 0));
        Assert.Throws<BeyondCapabilityException>(() => RepresentationTable.UpToDimension(RootSystem.Of("A1"), 100_000_000));
    }
}
