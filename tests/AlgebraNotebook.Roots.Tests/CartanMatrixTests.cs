using System.Numerics;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Tests;

/// <summary>
/// Cartan matrices against Humphreys, Introduction to Lie Algebras and Representation Theory, section 11.4.
/// Humphreys prints entries &lt;alpha_i, alpha_j&gt; = 2 (alpha_i, alpha_j) / (alpha_j, alpha_j); this library uses
/// A_ij = 2 (alpha_i, alpha_j) / (alpha_i, alpha_i), so the comparison is with the TRANSPOSE of the printed matrix.
/// Both use Bourbaki's node numbering.
/// </summary>
public class CartanMatrixTests
{
    /// <summary>The matrix as printed in Humphreys 11.4 (his convention), written out here from the book's pattern.</summary>
    private static int[,] Humphreys(CartanFamily family, int n)
    {
        switch (family)
        {
            case CartanFamily.E when n == 6:
                return new[,]
                {
                    { 2, 0, -1, 0, 0, 0 },
                    { 0, 2, 0, -1, 0, 0 },
                    { -1, 0, 2, -1, 0, 0 },
                    { 0, -1, -1, 2, -1, 0 },
                    { 0, 0, 0, -1, 2, -1 },
                    { 0, 0, 0, 0, -1, 2 },
                };
            case CartanFamily.E when n == 7:
                return new[,]
                {
                    { 2, 0, -1, 0, 0, 0, 0 },
                    { 0, 2, 0, -1, 0, 0, 0 },
                    { -1, 0, 2, -1, 0, 0, 0 },
                    { 0, -1, -1, 2, -1, 0, 0 },
                    { 0, 0, 0, -1, 2, -1, 0 },
                    { 0, 0, 0, 0, -1, 2, -1 },
                    { 0, 0, 0, 0, 0, -1, 2 },
                };
            case CartanFamily.E:
                return new[,]
                {
                    { 2, 0, -1, 0, 0, 0, 0, 0 },
                    { 0, 2, 0, -1, 0, 0, 0, 0 },
                    { -1, 0, 2, -1, 0, 0, 0, 0 },
                    { 0, -1, -1, 2, -1, 0, 0, 0 },
                    { 0, 0, 0, -1, 2, -1, 0, 0 },
                    { 0, 0, 0, 0, -1, 2, -1, 0 },
                    { 0, 0, 0, 0, 0, -1, 2, -1 },
                    { 0, 0, 0, 0, 0, 0, -1, 2 },
                };
            case CartanFamily.F:
                return new[,]
                {
                    { 2, -1, 0, 0 },
                    { -1, 2, -2, 0 },
                    { 0, -1, 2, -1 },
                    { 0, 0, -1, 2 },
                };
            case CartanFamily.G:
                return new[,]
                {
                    { 2, -1 },
                    { -3, 2 },
                };
        }

        var m = new int[n, n];
        for (var i = 0; i < n; i++)
        {
            m[i, i] = 2;
            if (i + 1 < n)
            {
                m[i, i + 1] = -1;
                m[i + 1, i] = -1;
            }
        }

        switch (family)
        {
            case CartanFamily.B:
                // B_l: entry (l-1, l) is -2.
                m[n - 2, n - 1] = -2;
                break;
            case CartanFamily.C:
                // C_l: entry (l, l-1) is -2.
                m[n - 1, n - 2] = -2;
                break;
            case CartanFamily.D:
                // D_l: node l joins node l-2, not node l-1.
                m[n - 2, n - 1] = 0;
                m[n - 1, n - 2] = 0;
                m[n - 3, n - 1] = -1;
                m[n - 1, n - 3] = -1;
                break;
        }

        return m;
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Cartan_matrix_is_the_transpose_of_Humphreys_11_4(string name)
    {
        var system = RootSystem.Of(name);
        var t = system.Type.Components[0];
        var printed = Humphreys(t.Family, t.Rank);
        var expected = Matrix<Rational>.FromFunction(t.Rank, t.Rank, (i, j) => printed[j, i]);
        Assert.Equal(expected, system.CartanMatrix);
    }

    /// <summary>Orders of P/Q = det A: A_n n+1, B_n and C_n 2, D_n 4, E6 3, E7 2, E8, F4, G2 1
    /// (Bourbaki Plates I-IX, item (VIII); Humphreys, Introduction to Lie Algebras, ch. 13, section numbers from memory).</summary>
    private static int PublishedDeterminant(CartanFamily family, int n) => family switch
    {
        CartanFamily.A => n + 1,
        CartanFamily.B or CartanFamily.C => 2,
        CartanFamily.D => 4,
        CartanFamily.E when n == 6 => 3,
        CartanFamily.E when n == 7 => 2,
        _ => 1,
    };

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Determinant_equals_the_order_of_the_centre(string name)
    {
        var system = RootSystem.Of(name);
        var t = system.Type.Components[0];
        var published = PublishedDeterminant(t.Family, t.Rank);
        Assert.Equal(new BigInteger(published), system.CartanDeterminant);
        Assert.Equal(new BigInteger(published), system.Centre.Order);

        // Cross-check with the Laplace expansion oracle of the exact core for small ranks.
        if (t.Rank <= 6)
        {
            Assert.Equal((Rational)published, LinearAlgebra.DeterminantLaplace(system.CartanMatrix));
        }
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Inverse_Cartan_matrix_is_an_exact_inverse_with_denominators_dividing_the_determinant(string name)
    {
        var system = RootSystem.Of(name);
        var n = system.Rank;
        Assert.Equal(Matrix<Rational>.Identity(n), system.CartanMatrix * system.InverseCartanMatrix);
        var det = system.CartanDeterminant;
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                // Cramer's rule: det * A^(-1) is integral (common practice); entries are positive for simple types (Humphreys 13, Table 1).
                Assert.True((system.InverseCartanMatrix[i, j] * (Rational)det).IsInteger, $"{name} entry ({i}, {j})");
                Assert.True(system.InverseCartanMatrix[i, j] > 0, $"{name} entry ({i}, {j})");
            }
        }
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Symmetrised_form_is_symmetric_positive_definite_with_long_roots_of_length_2(string name)
    {
        var system = RootSystem.Of(name);
        var b = system.SymmetrisedForm;
        Assert.True(b.IsSymmetric);
        for (var i = 0; i < system.Rank; i++)
        {
            Assert.Equal(system.SimpleRootLengthsSquared[i], b[i, i]);
        }

        Assert.Equal((Rational)2, system.SimpleRootLengthsSquared.Max());

        // Leading principal minors positive (Sylvester's criterion, common practice).
        for (var k = 1; k <= system.Rank; k++)
        {
            var idx = Enumerable.Range(0, k).ToArray();
            Assert.True(LinearAlgebra.Determinant(b.Submatrix(idx, idx)) > 0, $"{name} minor {k}");
        }
    }

    [Fact]
    public void Short_roots_have_the_published_squared_lengths()
    {
        // Long roots squared length 2: short roots of B_n, C_n, F4 have squared length 1, of G2 2/3 (common practice).
        Assert.Equal(new Rational[] { 2, 2, 1 }, RootSystem.Of("B3").SimpleRootLengthsSquared);
        Assert.Equal(new Rational[] { 1, 1, 2 }, RootSystem.Of("C3").SimpleRootLengthsSquared);
        Assert.Equal(new Rational[] { 2, 2, 1, 1 }, RootSystem.Of("F4").SimpleRootLengthsSquared);
        Assert.Equal(new Rational[] { new(2, 3), 2 }, RootSystem.Of("G2").SimpleRootLengthsSquared);
        Assert.Equal((Rational)3, RootSystem.Of("G2").LengthRatioSquared);
    }

    [Fact]
    public void Product_Cartan_matrix_is_block_diagonal_in_component_order()
    {
        var system = RootSystem.Of("B2+A1");
        var expected = Matrix.FromRows<Rational>([2, -1, 0], [-2, 2, 0], [0, 0, 2]);
        Assert.Equal(expected, system.CartanMatrix);
        Assert.Equal(new[] { 0, 2 }, system.ComponentOffsets);
    }
}
