using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class RepresentationNameTests
{
    // Names as in Slansky 1981 tables (from memory): su(N) N and Nbar; su(3) 6, 6bar, 15 = (2, 1), 15' = (4, 0);
    // E6 27, 27bar, 351 (antisymmetric in 27 x 27), 351' (symmetric); so(10) 16, 16bar, 126, 126bar; G2 77, 77'.
    [Theory]
    [InlineData("A4", new[] { 1, 0, 0, 0 }, "5")]
    [InlineData("A4", new[] { 0, 0, 0, 1 }, "5bar")]
    [InlineData("A4", new[] { 0, 1, 0, 0 }, "10")]
    [InlineData("A4", new[] { 0, 0, 1, 0 }, "10bar")]
    [InlineData("A4", new[] { 1, 0, 0, 1 }, "24")]
    [InlineData("A2", new[] { 2, 0 }, "6")]
    [InlineData("A2", new[] { 0, 2 }, "6bar")]
    [InlineData("A2", new[] { 2, 1 }, "15")]
    [InlineData("A2", new[] { 0, 4 }, "15'bar")]
    [InlineData("E6", new[] { 0, 0, 0, 0, 0, 1 }, "27bar")]
    [InlineData("E6", new[] { 0, 0, 1, 0, 0, 0 }, "351")]
    [InlineData("E6", new[] { 2, 0, 0, 0, 0, 0 }, "351'")]
    [InlineData("D5", new[] { 0, 0, 0, 0, 1 }, "16bar")]
    [InlineData("D5", new[] { 0, 0, 0, 0, 2 }, "126bar")]
    [InlineData("G2", new[] { 3, 0 }, "77")]
    [InlineData("G2", new[] { 0, 2 }, "77'")]
    [InlineData("E8", new[] { 0, 0, 0, 0, 0, 0, 0, 1 }, "248")]
    [InlineData("E7", new[] { 0, 0, 0, 0, 0, 0, 1 }, "56")]
    [InlineData("A1", new[] { 4 }, "5")]
    [InlineData("A2", new[] { 0, 0 }, "1")]
    public void Names_follow_the_stated_rule(string type, int[] labels, string expected)
    {
        Assert.Equal(expected, Irrep(type, labels).Name);
    }

    // so(8) triality: three 8-dimensional irreducibles of equal index; the rule orders them by labels: vector first.
    [Fact]
    public void So8_triality_octets_get_primes_in_label_order()
    {
        Assert.Equal("8", Irrep("D4", 1, 0, 0, 0).Name);
        Assert.Equal("8'", Irrep("D4", 0, 0, 1, 0).Name);
        Assert.Equal("8''", Irrep("D4", 0, 0, 0, 1).Name);
    }

    // Semisimple algebras: the factors' names in parentheses, as in the standard-model notation (3, 2) (common practice).
    [Fact]
    public void Semisimple_names_list_the_factors()
    {
        Assert.Equal("(3, 2)", Irrep("A2+A1", 1, 0, 1).Name);
        Assert.Equal("(3bar, 1)", Irrep("A2+A1", 0, 1, 0).Name);
        Assert.Equal("8 = (1, 1) of A2", Irrep("A2", 1, 1).ToString());
    }

    // When the search for equal dimensions is too long the name falls back to dimension and labels.
    [Fact]
    public void Huge_low_rank_dimensions_fall_back_to_labels()
    {
        Assert.Equal("1001500500(1000, 999)", Irrep("A2", 1000, 999).Name);
    }
}
