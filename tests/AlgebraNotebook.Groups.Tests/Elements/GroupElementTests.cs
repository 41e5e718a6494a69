using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Elements;

namespace AlgebraNotebook.Groups.Tests.Elements;

public class GroupElementTests
{
    private static readonly MatrixGroup<Rational> So3 = StandardGroups.SpecialOrthogonal(3);
    private static readonly MatrixGroup<Rational> Lorentz = StandardGroups.Lorentz();

    private static Polynomial<Rational> P(string text) => Polynomial<Rational>.Parse(text);

    [Fact]
    public void Collinear_boosts_add_rapidities()
    {
        // Collinear boosts compose by adding rapidities (common practice): B(z1) B(z2) = B(z1 + z2), checked through the addition theorems
        // cosh(a + b) = ch_a ch_b + sh_a sh_b, sinh(a + b) = sh_a ch_b + ch_a sh_b (common practice).
        var product = Lorentz.Exponential("K_x", "z1") * Lorentz.Exponential("K_x", "z2");
        var single = Lorentz.Exponential("K_x", "z");
        var ring = product.Legend.Ring<Rational>();
        var ch = P("ch_z1 ch_z2 + sh_z1 sh_z2");
        var sh = P("sh_z1 ch_z2 + ch_z1 sh_z2");
        var expected = single.Matrix!.Map(e => ring.Element(e.Representative.Substitute(AlgebraNotebook.Exact.Symbols.Symbol.Of("ch_z"), ch)
            .Substitute(AlgebraNotebook.Exact.Symbols.Symbol.Of("sh_z"), sh)));
        Assert.True(product.IsEqualTo(expected), $"{product}");
        Assert.Equal(ring.Element(ch), product.Matrix![3, 3]);
    }

    [Fact]
    public void Inverse_times_element_is_the_identity()
    {
        var g = So3.Exponential("L_x", "a") * So3.Exponential("L_y", "b") * GroupElements.Exponential(Matrix.ParseRational("[[1, 1, 0], [0, 1, 0], [0, 0, -2]]"), "c");
        var identity = GroupElements.Identity<Rational>(3);
        Assert.True((g * g.Inverse()).IsEqualTo(identity));
        Assert.True((g.Inverse() * g).IsEqualTo(identity));
    }

    [Fact]
    public void Adjoint_action_of_a_rotation_about_z_rotates_the_generator_L_x()
    {
        // Ad_{R_z(θ)} L_x = cos θ L_x + sin θ L_y (rotation of the axis vector; common practice).
        var g = So3.Exponential("L_z", "theta");
        var ad = g.Adjoint(So3.Generator("L_x"));
        var ring = g.Legend.Ring<Rational>();
        var expected = So3.Generator("L_x").Map(v => ring.Element(P("c_theta") * Polynomial<Rational>.Constant(v)))
            + So3.Generator("L_y").Map(v => ring.Element(P("s_theta") * Polynomial<Rational>.Constant(v)));
        Assert.Equal(expected, ad);
    }

    [Fact]
    public void Euler_z_y_z_intrinsic_matches_the_textbook_product()
    {
        // z-y-z intrinsic: R = R_z(α) R_y(β) R_z(γ); entry (2, 2) = cos β and (0, 2) = cos α sin β (common practice).
        var r = EulerAngles.ZYZIntrinsic();
        var ring = r.Legend.Ring<Rational>();
        Assert.True(ring.AreEqual(r.Matrix![2, 2].Representative, P("c_beta")));
        Assert.True(ring.AreEqual(r.Matrix![0, 2].Representative, P("c_alpha s_beta")));
        Assert.True(ring.AreEqual(r.Matrix![2, 0].Representative, P("-s_beta c_gamma")));
        Assert.Contains("z-y-z intrinsic", r.ToString());
        // Intrinsic (α, β, γ) equals extrinsic with the angles reversed (common practice).
        Assert.True(r.IsEqualTo(EulerAngles.Rotation("z-y-z", intrinsic: false, "gamma", "beta", "alpha")));
    }

    [Fact]
    public void First_kind_coordinates_on_the_heisenberg_group_are_polynomial()
    {
        // exp(a X + b Y + c Z) = [[1, a, c + a b/2], [0, 1, b], [0, 0, 1]] (common practice).
        var h = StandardGroups.Heisenberg();
        var g = GroupElements.FirstKind([h.Generator("X"), h.Generator("Y"), h.Generator("Z")], ["a", "b", "c"], ["X", "Y", "Z"]);
        Assert.True(g.IsExact);
        var ring = g.Legend.Ring<Rational>();
        Assert.Equal(ring.Element(P("c + 1/2 a b")), g.Matrix![0, 2]);
        // Second kind differs: exp(a X) exp(b Y) exp(c Z) has corner c + a b.
        var second = GroupElements.SecondKind([h.Generator("X"), h.Generator("Y"), h.Generator("Z")], ["a", "b", "c"]);
        Assert.True(second.Legend.Ring<Rational>().AreEqual(P("c + a b"), second.Matrix![0, 2].Representative));
    }

    [Fact]
    public void First_kind_coordinates_on_so3_fall_back_to_a_labelled_series()
    {
        var g = GroupElements.FirstKind([So3.Generator("L_x"), So3.Generator("L_y")], ["a", "b"], seriesOrder: 4);
        Assert.False(g.IsExact);
        Assert.Contains("truncated series", g.Note);
        // Its second-order part is (a L_x + b L_y)^2 / 2 (common practice): entry (0, 0) is -b^2/2.
        Assert.Equal("1 - 1/2*b^2 + O((a, b)^4)", g.Series![0, 0].ToString());
    }

    [Fact]
    public void Mismatched_sizes_are_rejected()
    {
        var error = Assert.Throws<ExactArgumentException>(() => So3.Exponential("L_x", "a") * Lorentz.Exponential("K_x", "z"));
        Assert.Contains("3x3", error.Message);
        Assert.Throws<ExactArgumentException>(() => GroupElements.FirstKind([So3.Generator("L_x"), Lorentz.Generator("K_x")], ["a", "b"]));
        Assert.Throws<ExactArgumentException>(() => GroupElements.FirstKind([So3.Generator("L_x")], ["a", "b"]));
        Assert.Throws<ExactArgumentException>(() => So3.Generator("K_x"));
        Assert.Throws<ExactArgumentException>(() => GroupElements.Constant(Matrix.ParseRational("[[1, 2], [2, 4]]")));
    }
}

public class SeriesGroupElementTests
{
    private static readonly MatrixGroup<Rational> So3 = StandardGroups.SpecialOrthogonal(3);

    [Fact]
    public void A_series_element_times_its_inverse_agrees_with_the_identity()
    {
        var g = GroupElements.FirstKind([So3.Generator("L_x"), So3.Generator("L_y")], ["a", "b"], seriesOrder: 5);
        Assert.True((g * g.Inverse()).IsEqualTo(GroupElements.Identity<Rational>(3)));
        // Mixing with an exact element gives a series of the smaller order.
        var mixed = g * So3.Exponential("L_z", "c");
        Assert.False(mixed.IsExact);
        Assert.Equal(5, mixed.SeriesOrder);
    }

    [Fact]
    public void Adjoint_series_of_a_first_kind_element_starts_with_the_bracket()
    {
        // Ad_{exp(Y)} X = X + [Y, X] + 1/2 [Y, [Y, X]] + ... (common practice); Y = a L_x + b L_y, X = L_z.
        var g = GroupElements.FirstKind([So3.Generator("L_x"), So3.Generator("L_y")], ["a", "b"], seriesOrder: 3);
        var ad = g.AdjointSeries(So3.Generator("L_z"), 2);
        // [a L_x + b L_y, L_z] = -a L_y + b L_x, so entry (0, 2) of the first-order part is b * (L_x)[0,2] - a * (L_y)[0,2] = -a.
        Assert.Equal("-a + O((a, b)^2)", ad[0, 2].ToString());
    }
}

public class GaussianExponentialTests
{
    [Fact]
    public void Exp_of_minus_i_theta_sigma_z_over_2_is_diagonal_in_half_angle_symbols()
    {
        // exp(-i θ σ_z / 2) = diag(cos θ/2 - i sin θ/2, cos θ/2 + i sin θ/2) (Sakurai, Modern Quantum Mechanics, §3.2, from memory).
        var e = AlgebraNotebook.Groups.Exponential.MatrixExponential.Of(StandardGroups.SpecialUnitary(2).Generator("X_z"), "theta");
        var ring = e.Legend.Ring<GaussianRational>();
        Assert.Equal(ring.Element(Polynomial<GaussianRational>.Parse("c_theta_2 - i s_theta_2")), e.ClosedForm![0, 0]);
        Assert.Equal(ring.Element(Polynomial<GaussianRational>.Parse("c_theta_2 + i s_theta_2")), e.ClosedForm![1, 1]);
        Assert.Contains("c_theta_2 = cos(theta/2)", e.ToString());
    }
}

public class GroupElementLogarithmTests
{
    [Fact]
    public void Logarithm_of_euler_angles_near_the_identity_starts_with_the_summed_generators()
    {
        // R_z(α) R_y(β) R_z(γ) = exp((α + γ) L_z + β L_y + 1/2 αβ [L_z, L_y] + ...) by BCH to second order (common practice);
        // [L_z, L_y] = -L_x.
        var so3 = StandardGroups.SpecialOrthogonal(3);
        var z = EulerAngles.ZYZIntrinsic().Logarithm(3);
        var text = z.Describe(so3.Generators);
        Assert.StartsWith("log(Euler[z-y-z intrinsic](alpha, beta, gamma)) = order 1: alpha*L_z + beta*L_y + gamma*L_z; order 2: ", text);
        var alphaBeta = AlgebraNotebook.Exact.Polynomials.Monomial.FromFactors([(AlgebraNotebook.Exact.Symbols.Symbol.Of("alpha"), 1), (AlgebraNotebook.Exact.Symbols.Symbol.Of("beta"), 1)]);
        Assert.Equal(so3.Generator("L_x").Map(v => v * new Rational(-1, 2)), z.Coefficient(alphaBeta));
    }

    [Fact]
    public void Logarithm_of_an_element_away_from_the_identity_is_rejected()
    {
        var g = GroupElements.Constant(Matrix.Diagonal<Rational>(-2, new Rational(-1, 2)), "g");
        var error = Assert.Throws<ExactArgumentException>(() => g.Logarithm(3));
        Assert.Contains("not near the identity", error.Message);
    }
}

public class SpecialUnitaryElementTests
{
    [Theory]
    [InlineData("S_12")]
    [InlineData("A_23")]
    [InlineData("D_2")]
    public void Exponentials_of_su3_generators_are_unitary_with_determinant_one(string generator)
    {
        // exp of an anti-Hermitian traceless matrix is in SU(n): U U^† = I, det U = e^{tr X} = 1 (common practice).
        var su3 = StandardGroups.SpecialUnitary(3);
        var u = su3.Exponential(generator, "t");
        var ring = u.Legend.Ring<GaussianRational>();
        var product = u.Matrix! * u.Matrix!.ConjugateTranspose();
        for (var i = 0; i < 3; i++)
        {
            for (var j = 0; j < 3; j++)
            {
                Assert.True(ring.AreEqual(product[i, j].Representative, i == j ? Polynomial<GaussianRational>.One : Polynomial<GaussianRational>.Zero), $"{u}: (U U^†)[{i},{j}] = {product[i, j]}");
            }
        }

        Assert.True(ring.AreEqual(LinearAlgebra.DeterminantLaplace(u.Matrix!).Representative, Polynomial<GaussianRational>.One));
        Assert.True(u.InverseMatrix!.Equals(u.Matrix!.ConjugateTranspose()));
    }
}
