using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Tests;

public class CartanMatrixIdentificationTests
{
    private static Matrix<Rational> Permute(Matrix<Rational> m, int[] rows) =>
        Matrix<Rational>.FromFunction(m.RowCount, m.ColumnCount, (i, j) => m[rows[i], rows[j]]);

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Shuffled_Cartan_matrices_are_recognised_with_a_valid_relabelling(string name)
    {
        var system = RootSystem.Of(name);
        var random = RandomisedTesting.NewRandom(7);
        for (var it = 0; it < RandomisedTesting.Iterations(3); it++)
        {
            var shuffle = Enumerable.Range(0, system.Rank).OrderBy(_ => random.Next()).ToArray();
            var given = Permute(system.CartanMatrix, shuffle);
            var found = CartanType.Identify(given);
            var text = $"{name} shuffled by [{string.Join(", ", shuffle)}]";

            // The classification of finite Cartan matrices (Humphreys, Introduction to Lie Algebras, 11.4) is unique up to
            // the coincidences, so the recognised type is isomorphic to the original.
            Assert.True(found.Type.IsIsomorphicTo(system.Type), $"{text}: {found}");
            Assert.True(RootSystem.Of(found.Type).CartanMatrix == Permute(given, found.RowOfNode.ToArray()), $"{text}: {found}");
        }
    }

    [Fact]
    public void Humphreys_printed_G2_is_recognised_after_transposing()
    {
        // Humphreys 11.4 prints G2 as [[2, -1], [-3, 2]] in his convention; ours is its transpose.
        var printed = Matrix.FromRows<Rational>([2, -1], [-3, 2]);
        var found = CartanType.Identify(printed.Transpose());
        Assert.Equal("G2", found.Type.ToString());
        Assert.Equal(new[] { 0, 1 }, found.RowOfNode);

        // Read untransposed, node 1 is the long root: the same type with the nodes swapped.
        Assert.Equal(new[] { 1, 0 }, CartanType.Identify(printed).RowOfNode);
    }

    [Fact]
    public void Block_diagonal_matrices_give_product_types()
    {
        var m = Matrix.DirectSum(RootSystem.Of("A2").CartanMatrix, RootSystem.Of("B3").CartanMatrix, RootSystem.Of("A1").CartanMatrix);
        var found = CartanType.Identify(m);
        Assert.Equal("A2+B3+A1", found.Type.ToString());
        Assert.Equal("A2+B3+A1: nodes 1, 2, 3, 4, 5, 6 are rows 0, 1, 2, 3, 4, 5 of the given matrix", found.ToString());
    }

    [Theory]
    [InlineData("[[2, -1, -1], [-1, 2, -1], [-1, -1, 2]]", "contains a cycle")] // affine A2 (Kac, Table Aff 1)
    [InlineData("[[2, -2], [-2, 2]]", "A_ij A_ji = 4")] // affine A1
    [InlineData("[[2, -1], [-1, 3]]", "Diagonal entry (1, 1) = 3")]
    [InlineData("[[2, 1], [1, 2]]", "is positive")]
    [InlineData("[[2, -1], [0, 2]]", "must be zero together")]
    [InlineData("[[2, -1/2], [-2, 2]]", "is not an integer")]
    [InlineData("[[2, -1, 0], [-1, 2]]", "")]
    public void Matrices_outside_the_finite_classification_are_refused_with_the_reason(string text, string reason)
    {
        if (reason.Length == 0)
        {
            // Ragged text is refused by the matrix reader itself.
            Assert.ThrowsAny<Exception>(() => CartanType.Identify(Matrix.ParseRational(text)));
            return;
        }

        var error = Assert.Throws<ExactArgumentException>(() => CartanType.Identify(Matrix.ParseRational(text)));
        Assert.Contains(reason, error.Message);
    }

    [Fact]
    public void Star_with_three_long_arms_is_affine_E6_and_refused()
    {
        // Affine E6 (Kac, Table Aff 1): a centre with three arms of length 2; a tree but not of finite type.
        var n = 7;
        var rows = new Rational[n][];
        for (var i = 0; i < n; i++)
        {
            rows[i] = new Rational[n];
            rows[i][i] = 2;
        }

        foreach (var (i, j) in new[] { (0, 1), (1, 2), (0, 3), (3, 4), (0, 5), (5, 6) })
        {
            rows[i][j] = -1;
            rows[j][i] = -1;
        }

        var error = Assert.Throws<ExactArgumentException>(() => CartanType.Identify(Matrix.FromRows(rows)));
        Assert.Contains("not of finite type", error.Message);
    }
}
