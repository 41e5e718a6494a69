using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Elements;

namespace AlgebraNotebook.Groups.Tests.Elements;

public class SpinCoverTests
{
    private static readonly MatrixGroup<GaussianRational> Su2 = StandardGroups.SpecialUnitary(2);
    private static readonly MatrixGroup<Rational> So3 = StandardGroups.SpecialOrthogonal(3);

    [Theory]
    [InlineData("X_x", "L_x")]
    [InlineData("X_y", "L_y")]
    [InlineData("X_z", "L_z")]
    public void Image_of_exp_minus_i_theta_sigma_over_2_is_the_rotation_by_theta_about_the_same_axis(string su2Generator, string so3Generator)
    {
        // Sakurai, Modern Quantum Mechanics, §3.3 (from memory): exp(-i θ σ·n/2) corresponds to the rotation by θ about n.
        var u = Su2.Exponential(su2Generator, "theta");
        var r = SpinCover.Rotation(u);
        var expected = So3.Exponential(so3Generator, "theta");
        Assert.True(r.IsEqualTo(expected), $"image {r} differs from {expected}");
        Assert.Contains("two-to-one", r.ToString());
        Assert.Contains("integer spin", r.ToString());
    }

    [Fact]
    public void U_and_minus_U_have_the_same_image()
    {
        // The kernel of SU(2) -> SO(3) is {I, -I} (common practice).
        var u = Su2.Exponential("X_y", "theta") * Su2.Exponential("X_z", "phi");
        var minus = GroupElements.Constant(Matrix.Diagonal<GaussianRational>(-1, -1), "-I");
        Assert.True(SpinCover.Rotation(u).IsEqualTo(SpinCover.Rotation(minus * u)));
        Assert.False(u.IsEqualTo(minus * u));
    }

    [Fact]
    public void Image_is_orthogonal_with_determinant_one()
    {
        // SO(3): R^T R = I, det R = 1 (common practice).
        var u = Su2.Exponential("X_x", "a") * Su2.Exponential("X_y", "b") * Su2.Exponential("X_z", "c");
        var r = SpinCover.Rotation(u);
        var ring = r.Legend.Ring<Rational>();
        var m = r.Matrix!;
        var product = m.Transpose() * m;
        for (var i = 0; i < 3; i++)
        {
            for (var j = 0; j < 3; j++)
            {
                Assert.True(ring.AreEqual(product[i, j].Representative, i == j ? Polynomial<Rational>.One : Polynomial<Rational>.Zero), $"(R^T R)[{i},{j}] = {product[i, j]}");
            }
        }

        var det = LinearAlgebra.DeterminantLaplace(m);
        Assert.True(ring.AreEqual(det.Representative, Polynomial<Rational>.One), $"det R = {det}");
    }

    [Fact]
    public void Image_of_a_constant_element_matches_the_trace_formula()
    {
        // U = i σ_x is in SU(2) (det = 1) and maps to the rotation by π about x: diag(1, -1, -1) (common practice).
        var u = Matrix.ParseGaussianRational("[[0, i], [i, 0]]");
        var r = SpinCover.Rotation(u);
        Assert.True(r.IsEqualTo(GroupElements.Constant(Matrix.Diagonal<Rational>(1, -1, -1))));
    }

    [Fact]
    public void A_matrix_outside_su2_is_rejected_with_the_reason()
    {
        // diag(i, i) is unitary with determinant -1.
        var error = Assert.Throws<ExactArgumentException>(() => SpinCover.Rotation(Matrix.ParseGaussianRational("[[i, 0], [0, i]]")));
        Assert.Contains("determinant", error.Message);
        var notUnitary = Assert.Throws<ExactArgumentException>(() => SpinCover.Rotation(Matrix.ParseGaussianRational("[[2, 0], [0, 1/2]]")));
        Assert.Contains("not unitary", notUnitary.Message);
    }
}
