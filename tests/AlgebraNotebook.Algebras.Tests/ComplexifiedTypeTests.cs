using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;
using Xunit;
using Xunit.Abstractions;

namespace AlgebraNotebook.Algebras.Tests;

public class ComplexifiedTypeTests(ITestOutputHelper output)
{
    private static LieAlgebra<Rational> Chevalley(string type)
    {
        var chevalley = ChevalleyBasis.Of(type);
        return chevalley.ToLieAlgebra(maximumDimension: chevalley.Dimension);
    }

    [Theory]
    // Dimensions and numbers of positive roots: Bourbaki, Lie Groups and Lie Algebras, ch. VI, Plates I-IX.
    [InlineData("A1", 3, 1)]
    [InlineData("A2", 8, 3)]
    [InlineData("B2", 10, 4)]
    [InlineData("G2", 14, 6)]
    [InlineData("B3", 21, 9)]
    [InlineData("C3", 21, 9)]
    [InlineData("A4", 24, 10)]
    [InlineData("D4", 28, 12)]
    public void Dense_random_basis_is_identified(string type, int dimension, int positiveRoots)
    {
        var algebra = DenseBasisChange.Disguise(Chevalley(type), seed: 11);
        var result = algebra.TypeOfComplexification();
        output.WriteLine(result.ToString());
        Assert.Equal(CartanType.Parse(type), result.Type);
        Assert.Equal(dimension, result.Dimension); // Bourbaki Plates I-IX (dimension)
        Assert.Equal(dimension - 2 * positiveRoots, result.Rank); // Bourbaki Plates I-IX (number of positive roots)
        Assert.Equal(RootSystem.Of(type).CartanMatrix, result.CartanMatrix);
        Assert.Equal(2, result.Primes.Count);
        Assert.Contains("modulo", result.RestsOn);
    }
}
