using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class BourbakiOrderTests
{
    private static Rational[,] M(int[,] a)
    {
        var n = a.GetLength(0);
        var m = new Rational[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                m[i, j] = a[i, j];
            }
        }

        return m;
    }

    // C2 in Bourbaki's numbering has A_12 = -2, A_21 = -1 with A_ij = 2(α_i, α_j)/(α_i, α_i) (α_1 short; Bourbaki Plate III,
    // from memory). The algebra layer names every rank-2 double bond B2 with the long root first, so the rows swap.
    [Fact]
    public void A_C2_matrix_is_named_B2_with_the_long_root_first()
    {
        var (type, order) = LieAlgebra<Rational>.IdentifyInBourbakiOrder(M(new[,] { { 2, -2 }, { -1, 2 } }));
        Assert.Equal("B2", type.ToString());
        Assert.Equal(new[] { 1, 0 }, order);
    }

    // D4 with the branch node in row 0 and outer nodes in rows 1, 2, 3 (Bourbaki Plate IV, from memory): alpha_1 is the
    // largest outer row, alpha_3 and alpha_4 the smaller ones in increasing order.
    [Fact]
    public void D4_outer_nodes_follow_the_fixed_choice()
    {
        var a = new[,] { { 2, -1, -1, -1 }, { -1, 2, 0, 0 }, { -1, 0, 2, 0 }, { -1, 0, 0, 2 } };
        var (type, order) = LieAlgebra<Rational>.IdentifyInBourbakiOrder(M(a));
        Assert.Equal("D4", type.ToString());
        Assert.Equal(new[] { 3, 0, 1, 2 }, order);
    }

    // E6 (Bourbaki Plate V, from memory): chain alpha_1 - alpha_3 - alpha_4 - alpha_5 - alpha_6, alpha_2 on alpha_4. Rows here:
    // alpha_4 = 0, alpha_2 = 1, arm (2, 3) and arm (4, 5); the arm next to alpha_4 with the smaller row (2) becomes alpha_3.
    [Fact]
    public void E6_arms_follow_the_fixed_choice()
    {
        var a = new int[6, 6];
        for (var i = 0; i < 6; i++)
        {
            a[i, i] = 2;
        }

        foreach (var (i, j) in new[] { (0, 1), (0, 2), (2, 3), (0, 4), (4, 5) })
        {
            a[i, j] = a[j, i] = -1;
        }

        var (type, order) = LieAlgebra<Rational>.IdentifyInBourbakiOrder(M(a));
        Assert.Equal("E6", type.ToString());
        Assert.Equal(new[] { 3, 1, 2, 0, 4, 5 }, order);
    }
}
