using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Operators.Tests;

public class CoulombTests
{
    // 1/r as a function symbol rinv with d/dx rinv = -x/r^3 and the relation rinv^2 (x^2 + y^2 + z^2) = 1.
    private static readonly CoefficientRing<GaussianRational> Ring =
        new CoefficientRingBuilder<GaussianRational>("Cartesian with 1/r")
            .Coordinates("x", "y", "z")
            .Parameters("k", "E")
            .Function("rinv", ("x", "-x*rinv^3"), ("y", "-y*rinv^3"), ("z", "-z*rinv^3"))
            .Relation("rinv^2*(x^2 + y^2 + z^2) = 1")
            .Build();

    private static DifferentialOperator<GaussianRational> Op(string text) => DifferentialOperator<GaussianRational>.Parse(Ring, text);

    private static DifferentialOperator<GaussianRational>[] Cross(DifferentialOperator<GaussianRational>[] a, DifferentialOperator<GaussianRational>[] b) =>
    [
        a[1] * b[2] - a[2] * b[1],
        a[2] * b[0] - a[0] * b[2],
        a[0] * b[1] - a[1] * b[0],
    ];

    [Fact]
    public void Derivative_of_one_over_r_is_minus_x_over_r_cubed()
    {
        // d/dx (1/r) = -x/r^3 (calculus; common practice), and the Laplacian of 1/r vanishes away from 0.
        Assert.Equal(Ring.Element("-x*rinv^3"), Ring.Derivative(Ring.Element("rinv"), "x"));
        Assert.True(Op("d_x^2 + d_y^2 + d_z^2").Apply(Ring.Element("rinv")).IsZero);
        // r^2 rinv^2 = 1: x^2 rinv^2 + y^2 rinv^2 + z^2 rinv^2 reduces to 1.
        Assert.Equal(Ring.One, Ring.Element("x^2*rinv^2 + y^2*rinv^2 + z^2*rinv^2"));
    }

    [Fact]
    public void Laplace_Runge_Lenz_vector_commutes_with_the_Coulomb_hamiltonian()
    {
        // Units hbar = m = 1, p = -i grad, H = p^2/2 - k/r; A = (p x L - L x p)/2 - k x/r
        // (Pauli 1926; Sakurai, Modern Quantum Mechanics, section 4.1, from memory): [H, A_i] = 0.
        var x = new[] { Op("x"), Op("y"), Op("z") };
        var p = new[] { Op("-i*d_x"), Op("-i*d_y"), Op("-i*d_z") };
        var l = Cross(x, p);
        var h = Op("-(d_x^2 + d_y^2 + d_z^2)/2 - k*rinv");
        var pl = Cross(p, l);
        var lp = Cross(l, p);
        var half = new GaussianRational(new Rational(1, 2), 0);
        var a = new DifferentialOperator<GaussianRational>[3];
        for (var i = 0; i < 3; i++)
        {
            a[i] = half * (pl[i] - lp[i]) - Op("k*rinv") * x[i];
        }

        Assert.Equal(2, a[0].Order);
        for (var i = 0; i < 3; i++)
        {
            var check = a[i].CommutesWith(h);
            Assert.True(check.Commutes, $"A_{i}: {check}");
        }

        // L commutes with H too (rotation invariance; common practice) ...
        foreach (var li in l)
        {
            Assert.True(li.CommutesWith(h).Commutes);
        }

        // ... but a wrong sign in the potential term breaks conservation, and the remainder says where.
        var wrong = half * (pl[0] - lp[0]) + Op("k*rinv") * x[0];
        var broken = wrong.CommutesWith(h);
        Assert.False(broken.Commutes);
        Assert.Equal(1, broken.Commutator.Order);
    }

    [Fact]
    public void Square_of_the_Runge_Lenz_vector_satisfies_Pauli_identity()
    {
        // A.A = 2 H (L^2 + hbar^2) + k^2 with hbar = m = 1 (Pauli 1926; from memory).
        var (h, l, a) = Build();
        var l2 = l[0] * l[0] + l[1] * l[1] + l[2] * l[2];
        var a2 = a[0] * a[0] + a[1] * a[1] + a[2] * a[2];
        Assert.Equal(Op("2") * h * (l2 + Op("1")) + Op("k^2"), a2);
    }

    [Fact]
    public void On_the_eigenspace_of_H_a_product_with_H_becomes_a_product_with_E()
    {
        var (h, l, _) = Build();
        var l2 = l[0] * l[0] + l[1] * l[1] + l[2] * l[2];
        var eigenspace = new Eigenspace<GaussianRational>("H", h, Ring.Element("E"));
        // L^2 H f = E L^2 f when H f = E f (and H L^2 = L^2 H since [H, L^2] = 0): equal remainders.
        var fromProduct = eigenspace.Simplify(l2 * h);
        var fromE = eigenspace.Simplify(Op("E") * l2);
        Assert.Equal(fromE.Operator, fromProduct.Operator);
        Assert.Equal(fromE.Operator, eigenspace.Simplify(h * l2).Operator);
        Assert.EndsWith("(on the eigenspace H = E)", fromProduct.ToString());
        Assert.Equal(Op("E"), eigenspace.Simplify(h).Operator);
        // The remainder has no d_x^2 term left (H's leading derivative).
        Assert.True(fromProduct.Operator.CoefficientOf("x", "x").IsZero);
    }

    [Fact]
    public void An_eigenspace_needs_an_invertible_leading_coefficient()
    {
        var error = Assert.Throws<AlgebraNotebook.Exact.ExactArgumentException>(
            () => new Eigenspace<GaussianRational>("G", Op("(x + 1)*d_x^2 + d_y"), Ring.Element("E")));
        Assert.Contains("x + 1", error.Message);
    }

    private static (DifferentialOperator<GaussianRational> H, DifferentialOperator<GaussianRational>[] L, DifferentialOperator<GaussianRational>[] A) Build()
    {
        var x = new[] { Op("x"), Op("y"), Op("z") };
        var p = new[] { Op("-i*d_x"), Op("-i*d_y"), Op("-i*d_z") };
        var l = Cross(x, p);
        var h = Op("-(d_x^2 + d_y^2 + d_z^2)/2 - k*rinv");
        var pl = Cross(p, l);
        var lp = Cross(l, p);
        var half = new GaussianRational(new Rational(1, 2), 0);
        var a = new DifferentialOperator<GaussianRational>[3];
        for (var i = 0; i < 3; i++)
        {
            a[i] = half * (pl[i] - lp[i]) - Op("k*rinv") * x[i];
        }

        return (h, l, a);
    }
}
