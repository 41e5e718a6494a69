using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Elements;

namespace AlgebraNotebook.Groups.Tests.Elements;

public class StandardGroupsTests
{
    private static void AssertIndependent<T>(MatrixGroup<T> group)
        where T : IFieldElement<T>
    {
        var n = group.Size;
        var columns = Matrix<T>.FromFunction(n * n, group.Dimension, (r, k) => group.Generators[k].Matrix[r / n, r % n]);
        Assert.Equal(group.Dimension, LinearAlgebra.Rank(columns));
    }

    [Theory]
    [InlineData(2, 1)]
    [InlineData(3, 3)]
    [InlineData(5, 10)]
    public void SO_n_generators_are_antisymmetric_with_dimension_n_n_minus_1_over_2(int n, int dimension)
    {
        // dim so(n) = n(n-1)/2 (common practice).
        var g = StandardGroups.SpecialOrthogonal(n);
        Assert.Equal(dimension, g.Dimension);
        Assert.All(g.Generators, x => Assert.True(x.Matrix.IsAntisymmetric, x.Name));
        AssertIndependent(g);
    }

    [Fact]
    public void SO3_generators_satisfy_L_x_L_y_commutator_L_z()
    {
        // [L_x, L_y] = L_z and cyclic (common practice).
        var g = StandardGroups.SpecialOrthogonal(3);
        Assert.Equal(g.Generator("L_z"), Matrix<Rational>.Commutator(g.Generator("L_x"), g.Generator("L_y")));
        Assert.Equal(g.Generator("L_x"), Matrix<Rational>.Commutator(g.Generator("L_y"), g.Generator("L_z")));
    }

    [Theory]
    [InlineData(2, 3)]
    [InlineData(3, 8)]
    [InlineData(4, 15)]
    public void SU_n_generators_are_anti_hermitian_traceless_with_dimension_n_squared_minus_1(int n, int dimension)
    {
        // dim su(n) = n^2 - 1 (common practice).
        var g = StandardGroups.SpecialUnitary(n);
        Assert.Equal(dimension, g.Dimension);
        Assert.All(g.Generators, x =>
        {
            Assert.Equal(-x.Matrix, x.Matrix.ConjugateTranspose());
            Assert.True(x.Matrix.Trace().IsZero, x.Name);
        });
        AssertIndependent(g);
    }

    [Fact]
    public void SU2_generators_follow_the_stated_pauli_convention()
    {
        // X_k = -i σ_k / 2 gives [X_x, X_y] = X_z (from [σ_x, σ_y] = 2 i σ_z; common practice).
        var g = StandardGroups.SpecialUnitary(2);
        Assert.Equal(g.Generator("X_z"), Matrix<GaussianRational>.Commutator(g.Generator("X_x"), g.Generator("X_y")));
    }

    [Theory]
    [InlineData(3, 1)]
    [InlineData(2, 2)]
    [InlineData(1, 2)]
    public void SO_p_q_generators_preserve_the_metric(int p, int q)
    {
        // so(p,q) = {X : X^T η + η X = 0}, dimension (p+q)(p+q-1)/2 (common practice).
        var g = StandardGroups.IndefiniteOrthogonal(p, q);
        var eta = Matrix.Diagonal(Enumerable.Range(0, p + q).Select(i => i < p ? Rational.One : Rational.MinusOne).ToArray());
        Assert.Equal((p + q) * (p + q - 1) / 2, g.Dimension);
        Assert.All(g.Generators, x => Assert.True((x.Matrix.Transpose() * eta + eta * x.Matrix).IsZero, x.Name));
        AssertIndependent(g);
    }

    [Fact]
    public void Lorentz_generators_preserve_the_metric_and_satisfy_the_boost_commutator()
    {
        // Signature (+,+,+,-), time last; [K_x, K_y] = -J_z and [J_x, K_y] = K_z (common practice for this sign convention).
        var g = StandardGroups.Lorentz();
        var eta = Matrix.Diagonal<Rational>(1, 1, 1, -1);
        Assert.All(g.Generators, x => Assert.True((x.Matrix.Transpose() * eta + eta * x.Matrix).IsZero, x.Name));
        Assert.Equal(-g.Generator("J_z"), Matrix<Rational>.Commutator(g.Generator("K_x"), g.Generator("K_y")));
        Assert.Equal(g.Generator("K_z"), Matrix<Rational>.Commutator(g.Generator("J_x"), g.Generator("K_y")));
        Assert.Contains("(+,+,+,-)", g.Conventions);
    }

    [Theory]
    [InlineData(1, 3)]
    [InlineData(2, 10)]
    [InlineData(3, 21)]
    public void Symplectic_generators_preserve_the_form_with_dimension_n_2n_plus_1(int n, int dimension)
    {
        // sp(2n) = {X : X^T Ω + Ω X = 0}, dimension n(2n+1) (common practice).
        var g = StandardGroups.Symplectic(n);
        var omega = Matrix<Rational>.FromFunction(2 * n, 2 * n, (i, j) => j == i + n ? 1 : i == j + n ? -1 : 0);
        Assert.Equal(dimension, g.Dimension);
        Assert.All(g.Generators, x => Assert.True((x.Matrix.Transpose() * omega + omega * x.Matrix).IsZero, x.Name));
        AssertIndependent(g);
    }

    [Fact]
    public void SL_n_generators_are_traceless_and_heisenberg_is_nilpotent()
    {
        var sl3 = StandardGroups.SpecialLinear(3);
        Assert.Equal(8, sl3.Dimension);
        Assert.All(sl3.Generators, x => Assert.True(x.Matrix.Trace().IsZero));
        AssertIndependent(sl3);
        var h = StandardGroups.Heisenberg();
        // [X, Y] = Z central (common practice).
        Assert.Equal(h.Generator("Z"), Matrix<Rational>.Commutator(h.Generator("X"), h.Generator("Y")));
        var se3 = StandardGroups.RigidMotions();
        Assert.Equal(se3.Generator("P_z"), Matrix<Rational>.Commutator(se3.Generator("J_x"), se3.Generator("P_y")));
    }

    [Fact]
    public void Rigid_motion_exponential_is_a_screw_motion()
    {
        // exp(θ J_z) is the rotation about z with no translation; exp(a P_x) translates by a (common practice).
        var se3 = StandardGroups.RigidMotions();
        var g = se3.Exponential("P_x", "a") * se3.Exponential("J_z", "theta");
        var ring = g.Legend.Ring<Rational>();
        Assert.True(ring.AreEqual(g.Matrix![0, 3].Representative, AlgebraNotebook.Exact.Polynomials.Polynomial<Rational>.Parse("a")));
        Assert.True(ring.AreEqual(g.Matrix![1, 0].Representative, AlgebraNotebook.Exact.Polynomials.Polynomial<Rational>.Parse("s_theta")));
    }

    [Fact]
    public void Bad_sizes_are_rejected()
    {
        Assert.Throws<ExactArgumentException>(() => StandardGroups.SpecialOrthogonal(1));
        Assert.Throws<ExactArgumentException>(() => StandardGroups.SpecialUnitary(0));
        Assert.Throws<ExactArgumentException>(() => StandardGroups.IndefiniteOrthogonal(-1, 3));
        Assert.Throws<ExactArgumentException>(() => StandardGroups.Symplectic(0));
    }
}
