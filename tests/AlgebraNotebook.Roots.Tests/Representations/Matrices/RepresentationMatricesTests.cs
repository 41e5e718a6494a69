using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots.Representations;
using AlgebraNotebook.Roots.Representations.Matrices;

namespace AlgebraNotebook.Roots.Tests.Representations.Matrices;

public class RepresentationMatricesTests
{
    public static TheoryData<string, int[]> Cases => new()
    {
        { "A1", [3] },
        { "A2", [1, 0] },
        { "A2", [1, 1] },
        { "A2", [2, 1] },
        { "A3", [0, 1, 0] },
        { "B2", [0, 1] },
        { "B2", [1, 1] },
        { "C3", [0, 1, 0] },
        { "B3", [0, 0, 1] },
        { "G2", [1, 0] },
        { "G2", [0, 1] },
        { "D4", [0, 1, 0, 0] },
        { "F4", [0, 0, 0, 1] },
        { "A1+B2", [1, 0, 1] },
    };

    // Serre's presentation of a semisimple Lie algebra (Humphreys, Introduction to Lie Algebras, 18.1, from memory):
    // [h_i, h_j] = 0, [e_i, f_j] = delta_ij h_i, [h_i, e_j] = A_ij e_j, [h_i, f_j] = -A_ij f_j, with
    // A_ij = <alpha_i^vee, alpha_j> (row i = coroot i), and ad(e_i)^(1 - A_ij) e_j = 0 = ad(f_i)^(1 - A_ij) f_j.
    [Theory]
    [MemberData(nameof(Cases))]
    public void Generators_satisfy_the_Chevalley_and_Serre_relations(string type, int[] labels)
    {
        var m = RepresentationMatrices.Of(type, labels);
        var a = m.System.CartanMatrix;
        var n = m.Dimension;
        var zero = Matrix<Rational>.Zero(n, n);
        for (var i = 1; i <= m.Rank; i++)
        {
            for (var j = 1; j <= m.Rank; j++)
            {
                var aij = a[i - 1, j - 1];
                Assert.Equal(zero, Matrix<Rational>.Commutator(m.H(i), m.H(j)));
                Assert.Equal(i == j ? m.H(i) : zero, Matrix<Rational>.Commutator(m.E(i), m.F(j)));
                Assert.Equal(Scale(aij, m.E(j)), Matrix<Rational>.Commutator(m.H(i), m.E(j)));
                Assert.Equal(Scale(-aij, m.F(j)), Matrix<Rational>.Commutator(m.H(i), m.F(j)));
                if (i != j)
                {
                    var power = 1 - (int)aij.Numerator;
                    var x = m.E(j);
                    var y = m.F(j);
                    for (var k = 0; k < power; k++)
                    {
                        x = Matrix<Rational>.Commutator(m.E(i), x);
                        y = Matrix<Rational>.Commutator(m.F(i), y);
                    }

                    Assert.True(x.Equals(zero), $"ad(e_{i})^{power} e_{j} != 0 in {type} {string.Join(",", labels)}");
                    Assert.True(y.Equals(zero), $"ad(f_{i})^{power} f_{j} != 0 in {type} {string.Join(",", labels)}");
                }
            }
        }
    }

    // Weyl's dimension formula and Freudenthal's multiplicities (Humphreys 24.3 and 22.3), via the Roots layer.
    [Theory]
    [MemberData(nameof(Cases))]
    public void Dimension_and_weight_multiplicities_match_Weyl_and_Freudenthal(string type, int[] labels)
    {
        var rep = IrreducibleRepresentation.Of(type, labels);
        var m = RepresentationMatrices.Of(rep);
        Assert.Equal(rep.Dimension, (System.Numerics.BigInteger)m.Dimension);
        var counts = m.Weights.GroupBy(w => w).ToDictionary(g => g.Key, g => g.Count());
        var expected = rep.AllWeights();
        Assert.Equal(expected.Count, counts.Count);
        foreach (var wm in expected)
        {
            Assert.Equal(wm.Multiplicity, (System.Numerics.BigInteger)counts[wm.Weight]);
        }

        for (var i = 1; i <= m.Rank; i++)
        {
            var h = m.H(i);
            for (var v = 0; v < m.Dimension; v++)
            {
                Assert.Equal(new Rational(m.Weights[v][i - 1]), h[v, v]);
            }
        }
    }

    // Fulton and Harris, Representation Theory, Lecture 13: the standard representation of sl(3) has dimension 3 and
    // weights of multiplicity one; the adjoint has dimension 8 with the zero weight of multiplicity 2.
    [Fact]
    public void Sl3_standard_and_adjoint_have_the_textbook_weights()
    {
        var standard = RepresentationMatrices.Of("A2", 1, 0);
        Assert.Equal(3, standard.Dimension);
        Assert.Equal(3, standard.Weights.Distinct().Count());
        var adjoint = RepresentationMatrices.Of("A2", 1, 1);
        Assert.Equal(8, adjoint.Dimension);
        Assert.Equal(2, adjoint.Weights.Count(w => w.IsZero));
    }

    // sl(2), highest weight n (Humphreys, Introduction to Lie Algebras, 7.2, from memory): with v_k = f^k v_0 / k!,
    // e v_k = (n - k + 1) v_(k-1); our basis is w_k = f^k v_0 = k! v_k, so f w_k = w_(k+1) and e w_k = k (n - k + 1) w_(k-1).
    [Theory]
    [InlineData(1)]
    [InlineData(4)]
    [InlineData(7)]
    public void Sl2_matrices_match_the_textbook_action(int n)
    {
        var m = RepresentationMatrices.Of("A1", n);
        Assert.Equal(n + 1, m.Dimension);
        var e = m.E(1);
        var f = m.F(1);
        for (var row = 0; row <= n; row++)
        {
            for (var col = 0; col <= n; col++)
            {
                Assert.Equal(row == col + 1 ? Rational.One : Rational.Zero, f[row, col]);
                Assert.Equal(row == col - 1 ? new Rational(col * (n - col + 1)) : Rational.Zero, e[row, col]);
            }

            Assert.Equal(new Weight(n - 2 * row), m.Weights[row]);
        }
    }

    // G2 has a 7-dimensional irreducible (Bourbaki Plate IX; Humphreys 19.3); the spinor of so(5) = B2 has dimension 4
    // (common practice).
    [Fact]
    public void G2_seven_and_B2_spinor_have_the_published_dimensions()
    {
        Assert.Equal(7, RepresentationMatrices.Of("G2", 1, 0).Dimension);
        Assert.Equal(4, RepresentationMatrices.Of("B2", 0, 1).Dimension);
    }

    // Root vectors of a Chevalley basis: [e_alpha, f_alpha] = h_alpha, the coroot written in the h_i (Humphreys 25.2).
    [Theory]
    [InlineData("A3", new[] { 1, 0, 0 })]
    [InlineData("B3", new[] { 1, 0, 0 })]
    [InlineData("C3", new[] { 1, 0, 0 })]
    [InlineData("G2", new[] { 1, 0 })]
    [InlineData("F4", new[] { 0, 0, 0, 1 })]
    public void Root_vectors_bracket_to_the_coroot(string type, int[] labels)
    {
        var m = RepresentationMatrices.Of(type, labels);
        var lengths = m.System.SimpleRootLengthsSquared;
        foreach (var root in m.System.PositiveRoots)
        {
            var expected = Matrix<Rational>.Zero(m.Dimension, m.Dimension);
            for (var i = 0; i < m.Rank; i++)
            {
                // alpha^vee = 2 alpha / (alpha, alpha) = sum_i c_i (alpha_i, alpha_i) / (alpha, alpha) alpha_i^vee
                var coefficient = root.Coordinates[i] * lengths[i] / root.LengthSquared;
                expected += Scale(coefficient, m.H(i + 1));
            }

            Assert.Equal(expected, Matrix<Rational>.Commutator(m.RaisingRootVector(root), m.LoweringRootVector(root)));
        }
    }

    // Bad input: the error names the dimension (Weyl's formula) and the cap; negative labels are refused.
    [Fact]
    public void Representation_above_the_cap_is_refused_with_its_dimension()
    {
        var ex = Assert.Throws<BeyondCapabilityException>(() => RepresentationMatrices.Of(IrreducibleRepresentation.Of("E8", 1, 0, 0, 0, 0, 0, 0, 0), 1000));
        Assert.Contains("3875", ex.Message);
        Assert.Contains("1000", ex.Message);
    }

    [Fact]
    public void Negative_labels_are_refused()
    {
        var ex = Assert.ThrowsAny<ExactArgumentException>(() => RepresentationMatrices.Of("A2", 1, -1));
        Assert.Contains("-1", ex.Message);
    }

    [Fact]
    public void Node_outside_the_diagram_is_refused()
    {
        var m = RepresentationMatrices.Of("A2", 1, 0);
        Assert.Throws<ExactArgumentException>(() => m.E(3));
        Assert.Contains("A_ij = <alpha_i^vee, alpha_j>", m.ToString());
    }

    private static Matrix<Rational> Scale(Rational c, Matrix<Rational> m) =>
        Matrix<Rational>.FromFunction(m.RowCount, m.ColumnCount, (i, j) => c * m[i, j]);
}
