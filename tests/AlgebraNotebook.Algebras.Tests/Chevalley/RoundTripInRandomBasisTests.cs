using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Tests.Chevalley;

public class RoundTripInRandomBasisTests
{
    // Each simple type is built from its Chevalley basis (Humphreys, Introduction to Lie Algebras, 25.2), rewritten in a
    // random unimodular integer basis (RandomBasisChange, fixed seed), and identified from the structure constants alone
    // by the modular variant. Dimensions and numbers of positive roots: Bourbaki, Lie Groups and Lie Algebras, Plates I-IX
    // (from memory). E6, B6 and C6 all have dimension 78, rank 6 and 36 positive roots, so only the roots tell them apart.
    [Theory]
    [InlineData("A1", 3, 1)]
    [InlineData("A2", 8, 3)]
    [InlineData("A3", 15, 6)]
    [InlineData("A4", 24, 10)]
    [InlineData("A5", 35, 15)]
    [InlineData("A6", 48, 21)]
    [InlineData("B2", 10, 4)]
    [InlineData("B3", 21, 9)]
    [InlineData("B4", 36, 16)]
    [InlineData("B5", 55, 25)]
    [InlineData("B6", 78, 36)]
    [InlineData("C3", 21, 9)]
    [InlineData("C4", 36, 16)]
    [InlineData("C5", 55, 25)]
    [InlineData("C6", 78, 36)]
    [InlineData("D4", 28, 12)]
    [InlineData("D5", 45, 20)]
    [InlineData("D6", 66, 30)]
    [InlineData("G2", 14, 6)]
    [InlineData("F4", 52, 24)]
    [InlineData("E6", 78, 36)]
    [InlineData("E7", 133, 63)]
    public void Type_is_identified_after_a_random_change_of_basis(string type, int dimension, int positiveRoots)
    {
        for (var trial = 0; trial < KillingFormTests.Iterations; trial++)
        {
            var seed = 100 + trial;
            var algebra = RandomBasisChange.Disguised(type, seed);
            Assert.Equal(dimension, algebra.Dimension);
            var decomposition = algebra.RootDecompositionModular();
            var expected = CartanType.Parse(type);
            Assert.True(decomposition.IsSplit, $"{type}, seed {seed}: {decomposition.Note}");
            Assert.True(decomposition.Type!.IsIsomorphicTo(expected), $"{type}, seed {seed}: identified as {decomposition.Type}");
            Assert.Equal(expected.Rank, decomposition.Rank);
            Assert.Equal(2 * positiveRoots, decomposition.Roots.Count);
            Assert.Equal(positiveRoots, decomposition.PositiveRoots.Count);
            Assert.Equal(RootSystem.Of(decomposition.Type).CartanMatrix, decomposition.CartanMatrix);
        }
    }

    // A semisimple, non-simple type keeps both components (B2 + A1: Bourbaki Plates I and II, from memory).
    [Fact]
    public void Semisimple_type_B2_plus_A1_is_identified_after_a_random_change_of_basis()
    {
        var algebra = RandomBasisChange.Disguised("B2+A1", 5);
        var decomposition = algebra.RootDecomposition();
        Assert.True(decomposition.Type!.IsIsomorphicTo(CartanType.Parse("B2+A1")), $"identified as {decomposition.Type}");
        Assert.Equal(10, decomposition.Roots.Count);
    }

    // Every root vector returned is a common eigenvector with its values (the definition of a root space; common practice),
    // checked here with the public bracket, independently of the variant's own proof.
    [Fact]
    public void Root_vectors_of_a_disguised_F4_are_common_eigenvectors()
    {
        var algebra = RandomBasisChange.Disguised("F4", 11);
        var decomposition = algebra.RootDecomposition();
        foreach (var root in decomposition.Roots)
        {
            for (var i = 0; i < decomposition.Rank; i++)
            {
                Assert.Equal(root.Values[i] * root.Vector, algebra.Bracket(decomposition.CartanSubalgebra[i], root.Vector));
            }
        }
    }
}
