using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Operators.Tests;

public class CoordinateChangeTests
{
    private static readonly CoefficientRing<GaussianRational> Cartesian = CoordinateSystems.CartesianWithRadii<GaussianRational>("hbar");
    private static readonly CoefficientRing<GaussianRational> Spherical = CoordinateSystems.Spherical<GaussianRational>("hbar");
    private static readonly CoordinateChange<GaussianRational> ToSpherical = CoordinateSystems.CartesianToSpherical(Cartesian, Spherical);

    private static DifferentialOperator<GaussianRational> Cart(string text) => DifferentialOperator<GaussianRational>.Parse(Cartesian, text);

    private static DifferentialOperator<GaussianRational> Sph(string text) => DifferentialOperator<GaussianRational>.Parse(Spherical, text);

    [Fact]
    public void Spherical_jacobian_determinant_is_r_squared_sin_theta()
    {
        // dx dy dz = r^2 sin theta dr dtheta dphi (common practice).
        Assert.Equal(Spherical.Element("r^2*st"), ToSpherical.JacobianDeterminant);
        // d/dz = cos theta d/dr - sin theta / r d/dtheta (common practice).
        Assert.Equal(Sph("ct*d_r - st*rinv*d_theta"), ToSpherical.PartialImage("z"));
    }

    [Fact]
    public void L_z_in_spherical_coordinates_is_minus_i_hbar_d_phi()
    {
        // Griffiths, Introduction to Quantum Mechanics, section 4.3: L_z = -i hbar d/dphi (from memory).
        Assert.Equal(Sph("-i*hbar*d_phi"), ToSpherical.Apply(Cart("-i*hbar*(x*d_y - y*d_x)")));
    }

    [Fact]
    public void L_plus_in_spherical_coordinates_matches_the_textbook_form()
    {
        // Griffiths eq. 4.130: L_+ = hbar e^{i phi} (d/dtheta + i cot theta d/dphi) (from memory),
        // with e^{i phi} = cp + i sp and cot theta = ct*stinv.
        var lx = Cart("-i*hbar*(y*d_z - z*d_y)");
        var ly = Cart("-i*hbar*(z*d_x - x*d_z)");
        var lPlus = lx + GaussianRational.I * ly;
        Assert.Equal(Sph("hbar*(cp + i*sp)*(d_theta + i*ct*stinv*d_phi)"), ToSpherical.Apply(lPlus));
    }

    [Fact]
    public void Laplacian_in_spherical_coordinates_matches_the_textbook_form()
    {
        // Griffiths eq. 4.13 (from memory): laplacian = d_r^2 + (2/r) d_r + (1/r^2)(d_theta^2 + cot theta d_theta + d_phi^2 / sin^2 theta).
        var expected = Sph("d_r^2 + 2*rinv*d_r + rinv^2*(d_theta^2 + ct*stinv*d_theta + stinv^2*d_phi^2)");
        Assert.Equal(expected, ToSpherical.Apply(Cart("d_x^2 + d_y^2 + d_z^2")));
    }

    [Fact]
    public void Spherical_ladder_operators_obey_the_angular_momentum_commutation_relations()
    {
        // Griffiths, Introduction to Quantum Mechanics, section 4.3 (from memory): L_+- = +-hbar e^{+-i phi}
        // (d_theta +- i cot theta d_phi), L_z = -i hbar d_phi, with [L_z, L_+-] = +-hbar L_+- and [L_+, L_-] = 2 hbar L_z.
        // Written in the spherical ring: e^{+-i phi} = cp +- i sp, cot theta = ct*stinv.
        var lPlus = Sph("hbar*(cp + i*sp)*(d_theta + i*ct*stinv*d_phi)");
        var lMinus = Sph("-hbar*(cp - i*sp)*(d_theta - i*ct*stinv*d_phi)");
        var lZ = Sph("-i*hbar*d_phi");
        var hbar = Sph("hbar");
        Assert.Equal(hbar * lPlus, DifferentialOperator<GaussianRational>.Commutator(lZ, lPlus));
        Assert.Equal(-(hbar * lMinus), DifferentialOperator<GaussianRational>.Commutator(lZ, lMinus));
        Assert.Equal(Sph("2*hbar") * lZ, DifferentialOperator<GaussianRational>.Commutator(lPlus, lMinus));
    }

    [Fact]
    public void Spherical_operators_rewrite_back_to_Cartesian()
    {
        var back = CoordinateSystems.SphericalToCartesian(Spherical, Cartesian);
        // d/dphi = x d/dy - y d/dx and r d/dr = x d/dx + y d/dy + z d/dz (common practice).
        Assert.Equal(Cart("x*d_y - y*d_x"), back.Apply(Sph("d_phi")));
        Assert.Equal(Cart("x*d_x + y*d_y + z*d_z"), back.Apply(Sph("r*d_r")));
        // Round trip of the polar derivative.
        var lPlus = Sph("hbar*(cp + i*sp)*(d_theta + i*ct*stinv*d_phi)");
        Assert.Equal(lPlus, ToSpherical.Apply(back.Apply(lPlus)));
    }

    [Fact]
    public void Polar_coordinates_rewrite_the_plane_laplacian_and_back()
    {
        var plane = CoordinateSystems.CartesianPlane<Rational>();
        var polar = CoordinateSystems.Polar<Rational>();
        var change = CoordinateSystems.CartesianToPolar(plane, polar);
        // Laplacian in polar coordinates: d_r^2 + (1/r) d_r + (1/r^2) d_phi^2 (common practice).
        var laplacian = DifferentialOperator<Rational>.Parse(plane, "d_x^2 + d_y^2");
        Assert.Equal(DifferentialOperator<Rational>.Parse(polar, "d_r^2 + rinv*d_r + rinv^2*d_phi^2"), change.Apply(laplacian));
        Assert.Equal(polar.Element("r"), change.JacobianDeterminant);
        var back = CoordinateSystems.PolarToCartesian(polar, plane);
        Assert.Equal(DifferentialOperator<Rational>.Parse(plane, "x*d_y - y*d_x"), back.Apply(DifferentialOperator<Rational>.Parse(polar, "d_phi")));
        Assert.Equal(laplacian, back.Apply(change.Apply(laplacian)));
    }

    [Fact]
    public void Cylindrical_coordinates_turn_the_z_rotation_into_d_phi()
    {
        var cartesian = CoordinateSystems.Cartesian<Rational>();
        var cylindrical = CoordinateSystems.Cylindrical<Rational>();
        var change = CoordinateSystems.CartesianToCylindrical(cartesian, cylindrical);
        Assert.Equal(
            DifferentialOperator<Rational>.Parse(cylindrical, "d_phi"),
            change.Apply(DifferentialOperator<Rational>.Parse(cartesian, "x*d_y - y*d_x")));
        Assert.Equal(cylindrical.Element("rho"), change.JacobianDeterminant);
    }

    [Fact]
    public void Operators_over_different_rings_do_not_mix_without_a_change()
    {
        var error = Assert.Throws<ExactArgumentException>(() => Cart("d_x") + Sph("d_r"));
        Assert.Contains("spherical (r, theta, phi)", error.Message);
        var wrongSource = Assert.Throws<ExactArgumentException>(() => ToSpherical.Apply(Sph("d_r")));
        Assert.Contains("this change rewrites operators from ring \"Cartesian (x, y, z) with r and rho\"", wrongSource.Message);
        // Two rings declared alike are still different rings.
        var other = CoordinateSystems.CartesianWithRadii<GaussianRational>("hbar");
        Assert.Throws<ExactArgumentException>(() => DifferentialOperator<GaussianRational>.Commutator(Cart("d_x"), DifferentialOperator<GaussianRational>.Parse(other, "x")));
    }

    [Fact]
    public void Bare_angles_have_no_Cartesian_image()
    {
        var back = CoordinateSystems.SphericalToCartesian(Spherical, Cartesian);
        var error = Assert.Throws<ExactArgumentException>(() => back.Apply(Sph("theta*d_r")));
        Assert.Contains("theta has no image", error.Message);
    }

    [Fact]
    public void A_change_that_breaks_a_relation_is_rejected()
    {
        var plane = CoordinateSystems.CartesianPlane<Rational>();
        var polar = CoordinateSystems.Polar<Rational>();
        var images = new Dictionary<string, string> { ["x"] = "r*cp", ["y"] = "r*sp", ["r"] = "2*r" };
        var error = Assert.Throws<ExactArgumentException>(() => CoordinateChange<Rational>.FromCoordinateFormulas(plane, polar, images));
        Assert.Contains("does not respect the relation", error.Message);
    }

    [Fact]
    public void User_declared_light_cone_coordinates_factor_the_wave_operator()
    {
        // u = x + t, v = x - t: d_t^2 - d_x^2 = -4 d_u d_v (d'Alembert's factorisation; common practice).
        var xt = new CoefficientRingBuilder<Rational>("(x, t)").Coordinates("x", "t").Build();
        var uv = new CoefficientRingBuilder<Rational>("light cone (u, v)").Coordinates("u", "v").Build();
        var change = CoordinateChange<Rational>.FromCoordinateFormulas(xt, uv, new Dictionary<string, string> { ["x"] = "(u + v)/2", ["t"] = "(u - v)/2" });
        Assert.Equal(uv.Element("-1/2"), change.JacobianDeterminant);
        Assert.Equal(DifferentialOperator<Rational>.Parse(uv, "-4*d_u*d_v"), change.Apply(DifferentialOperator<Rational>.Parse(xt, "d_t^2 - d_x^2")));
        Assert.Equal(uv.Element("u^2 - v^2"), change.Apply(xt.Element("4*x*t")));
    }

    [Fact]
    public void A_change_with_a_non_invertible_jacobian_is_rejected()
    {
        var xt = new CoefficientRingBuilder<Rational>("(x, t) again").Coordinates("x", "t").Build();
        var uv = new CoefficientRingBuilder<Rational>("(u, v) again").Coordinates("u", "v").Build();
        var images = new Dictionary<string, string> { ["x"] = "u + v", ["t"] = "u^2" };
        var error = Assert.Throws<ExactArgumentException>(() => CoordinateChange<Rational>.FromCoordinateFormulas(xt, uv, images));
        Assert.Contains("Jacobian determinant -2*u", error.Message);
        var missing = Assert.Throws<ExactArgumentException>(
            () => CoordinateChange<Rational>.FromCoordinateFormulas(xt, uv, new Dictionary<string, string> { ["x"] = "u" }));
        Assert.Contains("t of ring", missing.Message);
    }
}
