using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Roots.Tests;

public class CartanTypeTests
{
    [Theory]
    [InlineData("A3", "A3", 3)]
    [InlineData("E8", "E8", 8)]
    [InlineData("B2+A1", "B2+A1", 3)]
    [InlineData("A1 + A1", "A1+A1", 2)]
    [InlineData("e6", "E6", 6)]
    [InlineData(" g2 ", "G2", 2)]
    [InlineData("A_3", "A3", 3)]
    [InlineData("D4+E8+A1", "D4+E8+A1", 13)]
    public void Parse_reads_simple_and_product_types(string text, string expected, int rank)
    {
        var type = CartanType.Parse(text);
        Assert.Equal(expected, type.ToString());
        Assert.Equal(rank, type.Rank);
        Assert.Equal(type, CartanType.Parse(type.ToString()));
    }

    [Theory]
    [InlineData("E9", "E9 is not a finite type: E exists for ranks 6, 7, 8")]
    [InlineData("E5", "E exists for ranks 6, 7, 8")]
    [InlineData("A0", "A needs rank at least 1")]
    [InlineData("D1", "D1 = so(2) is abelian")]
    [InlineData("G3", "G exists only for rank 2")]
    [InlineData("F5", "F exists only for rank 4")]
    [InlineData("X3", "unknown family 'X'")]
    [InlineData("", "empty")]
    [InlineData("   ", "empty")]
    [InlineData("A", "has no rank")]
    [InlineData("A3+", "component 2 is empty")]
    [InlineData("B2+E9", "Cartan type \"B2+E9\": E9 is not a finite type")]
    [InlineData("A3.5", "is not a whole number")]
    [InlineData("A99999999999", "too large")]
    public void Bad_strings_give_errors_naming_the_input_and_the_reason(string text, string fragment)
    {
        var error = Assert.Throws<ExactArgumentException>(() => CartanType.Parse(text));
        Assert.Contains(fragment, error.Message);
        Assert.False(CartanType.TryParse(text, out _));
    }

    [Fact]
    public void Root_system_of_a_bad_string_throws_the_same_error()
    {
        var error = Assert.Throws<ExactArgumentException>(() => RootSystem.Of("E9"));
        Assert.Contains("E9", error.Message);
        Assert.Throws<ExactArgumentException>(() => SimpleCartanType.Of(CartanFamily.B, 0));
    }

    [Theory]
    [InlineData("C2", "B2", "C2 is isomorphic to B2")]
    [InlineData("D3", "A3", "D3 is isomorphic to A3")]
    [InlineData("D2", "A1+A1", "D2 is isomorphic to A1+A1")]
    [InlineData("B1", "A1", "B1 is isomorphic to A1")]
    [InlineData("C1", "A1", "C1 is isomorphic to A1")]
    public void Low_rank_coincidences_are_kept_and_stated(string text, string isomorphic, string statement)
    {
        // Low-rank isomorphisms: Humphreys, Introduction to Lie Algebras, 11.4 (remarks after the classification); common practice.
        var type = CartanType.Parse(text);
        Assert.Equal(text, type.ToString());
        Assert.Contains(statement, type.Coincidence);
        Assert.True(type.IsIsomorphicTo(CartanType.Parse(isomorphic)));
        Assert.NotEqual(type, CartanType.Parse(isomorphic));
    }

    [Fact]
    public void Coincident_types_have_the_same_numbers()
    {
        foreach (var (a, b) in new[] { ("C2", "B2"), ("D3", "A3"), ("D2", "A1+A1"), ("B1", "A1"), ("C1", "A1") })
        {
            var x = RootSystem.Of(a);
            var y = RootSystem.Of(b);
            Assert.Equal(y.NumberOfPositiveRoots, x.NumberOfPositiveRoots);
            Assert.Equal(y.WeylGroup.Order, x.WeylGroup.Order);
            Assert.Equal(y.Exponents, x.Exponents);
            Assert.Equal(y.CartanDeterminant, x.CartanDeterminant);
            Assert.Equal(y.Centre.Structure, x.Centre.Structure);
        }
    }

    [Fact]
    public void Types_without_coincidence_say_nothing()
    {
        Assert.Null(CartanType.Parse("E8").Coincidence);
        Assert.Null(CartanType.Parse("B2+A1").Coincidence);
        Assert.NotNull(CartanType.Parse("C2+A1").Coincidence);
    }

    [Fact]
    public void Product_order_matters_for_equality_but_not_for_isomorphism()
    {
        var ab = CartanType.Parse("A1+B2");
        var ba = CartanType.Parse("B2+A1");
        Assert.NotEqual(ab, ba);
        Assert.True(ab.IsIsomorphicTo(ba));
        Assert.Equal("A1+B2", ab.CanonicalForm().ToString());
        Assert.Equal("A3+A1+A1+B2", CartanType.Parse("D2+C2+D3").CanonicalForm().ToString());
    }

    [Fact]
    public void Equal_types_have_equal_hash_codes()
    {
        Assert.Equal(CartanType.Parse("e8 + a1").GetHashCode(), CartanType.Parse("E8+A1").GetHashCode());
        Assert.True(CartanType.Parse("E8") == CartanType.Of(CartanFamily.E, 8));
        Assert.Equal("E8", SimpleCartanType.Of(CartanFamily.E, 8).ToString());
    }
}
