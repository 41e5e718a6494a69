using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Tests.Chevalley;

public class ChevalleyRoundTripTests
{
    // The algebra layer's root decomposition and summary identify the constructed algebra as the type it was built from
    // (identification by the Cartan matrix: Humphreys 11.4 and de Graaf, Lie Algebras: Theory and Algorithms, ch. 5).
    [Theory]
    [InlineData("A1")]
    [InlineData("A2")]
    [InlineData("A3")]
    [InlineData("A4")]
    [InlineData("B2")]
    [InlineData("B3")]
    [InlineData("C3")]
    [InlineData("D4")]
    [InlineData("G2")]
    [InlineData("F4")]
    [InlineData("B2+A1")]
    public void Root_decomposition_identifies_the_type(string type)
    {
        var basis = ChevalleyBasis.Of(type);
        var algebra = basis.ToLieAlgebra();
        var decomposition = algebra.RootDecomposition();
        Assert.NotNull(decomposition.Type);
        Assert.True(decomposition.Type!.IsIsomorphicTo(CartanType.Parse(type)), $"{type} identified as {decomposition.Type}");
    }

    [Theory]
    [InlineData("A3")]
    [InlineData("C3")]
    [InlineData("G2")]
    public void Summary_reports_a_simple_algebra_of_the_type(string type)
    {
        var summary = ChevalleyBasis.Of(type).ToLieAlgebra().Summary();
        Assert.True(summary.IsSemisimple);
        Assert.NotNull(summary.LeviFactorType);
        Assert.True(summary.LeviFactorType!.IsIsomorphicTo(CartanType.Parse(type)));
    }
}
