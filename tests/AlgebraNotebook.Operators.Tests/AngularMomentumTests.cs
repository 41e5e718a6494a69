using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Operators.Tests;

public class AngularMomentumTests
{
    private static readonly CoefficientRing<GaussianRational> Ring =
        new CoefficientRingBuilder<GaussianRational>("Cartesian (x, y, z)").Coordinates("x", "y", "z").Parameters("hbar").Build();

    private static DifferentialOperator<GaussianRational> Op(string text) => DifferentialOperator<GaussianRational>.Parse(Ring, text);

    // L_i = -i hbar eps_ijk x_j d_k (Griffiths, Introduction to Quantum Mechanics, section 4.3; from memory).
    private static readonly DifferentialOperator<GaussianRational> Lx = Op("-i*hbar*(y*d_z - z*d_y)");
    private static readonly DifferentialOperator<GaussianRational> Ly = Op("-i*hbar*(z*d_x - x*d_z)");
    private static readonly DifferentialOperator<GaussianRational> Lz = Op("-i*hbar*(x*d_y - y*d_x)");

    [Fact]
    public void Commutators_of_orbital_angular_momentum_are_i_hbar_times_the_third_component_cyclically()
    {
        var ihbar = Op("i*hbar");
        // Griffiths section 4.3, [L_x, L_y] = i hbar L_z and cyclic (from memory).
        Assert.Equal(ihbar * Lz, DifferentialOperator<GaussianRational>.Commutator(Lx, Ly));
        Assert.Equal(ihbar * Ly, DifferentialOperator<GaussianRational>.Commutator(Lz, Lx));
        Assert.Equal(ihbar * Lx, DifferentialOperator<GaussianRational>.Commutator(Ly, Lz));
        Assert.NotEqual(ihbar * Lx, DifferentialOperator<GaussianRational>.Commutator(Lz, Ly));
    }

    [Fact]
    public void L_squared_commutes_with_each_component()
    {
        var l2 = Lx.Pow(2) + Ly.Pow(2) + Lz.Pow(2);
        Assert.Equal(2, l2.Order);
        // Griffiths section 4.3: [L^2, L_i] = 0 (from memory).
        foreach (var l in new[] { Lx, Ly, Lz })
        {
            var check = l.CommutesWith(l2);
            Assert.True(check.Commutes, check.ToString());
        }

        // A component does not commute with another one; the remainder is the commutator.
        var failing = Lx.CommutesWith(Ly);
        Assert.False(failing.Commutes);
        Assert.Equal(DifferentialOperator<GaussianRational>.Commutator(Ly, Lx), failing.Commutator);
    }

    [Fact]
    public void Rescaled_components_close_into_so3_with_the_stated_real_basis()
    {
        // Real basis e_k = i L_k / hbar = eps_kjl x_j d_l: e_x = y d_z - z d_y, e_y = z d_x - x d_z, e_z = x d_y - y d_x.
        // Then [e_x, e_y] = -e_z and cyclic (follows from [L_x, L_y] = i hbar L_z, Griffiths section 4.3; common practice).
        var span = new OperatorSpan<GaussianRational>([
            ("e_x", Op("y*d_z - z*d_y")),
            ("e_y", Op("z*d_x - x*d_z")),
            ("e_z", Op("x*d_y - y*d_x")),
        ]);
        var table = span.StructureConstants();
        Assert.Equal(3, table.Dimension);
        Assert.Equal("[e_x, e_y] = -e_z", table.BracketText(0, 1));
        Assert.Equal("[e_x, e_z] = e_y", table.BracketText(0, 2));
        Assert.Equal("[e_y, e_z] = -e_x", table.BracketText(1, 2));
        Assert.Equal(new GaussianRational(-1, 0), table[0, 1, 2]);
        Assert.Equal(new GaussianRational(1, 0), table[1, 0, 2]);
    }

    [Fact]
    public void Span_with_hbar_in_the_brackets_is_reported_as_not_closing_with_constant_coefficients()
    {
        var span = new OperatorSpan<GaussianRational>([("L_x", Lx), ("L_y", Ly), ("L_z", Lz)]);
        var error = Assert.Throws<AlgebraNotebook.Exact.ExactArgumentException>(() => span.StructureConstants());
        Assert.Contains("[L_x, L_y]", error.Message);
    }

    [Fact]
    public void Operator_text_is_normal_form_and_parses_back()
    {
        Assert.Equal("i*hbar*z*d_y - i*hbar*y*d_z", Lx.ToString());
        Assert.Equal(Lx, Op(Lx.ToString()));
        Assert.Equal("i*hbar*(z*d_y - y*d_z)", Lx.ToFactoredString());
        Assert.Equal(Lx, Op(Lx.ToFactoredString()));
        Assert.Equal("-(x*d_x + 1)", Op("-d_x*x").ToFactoredString());
        Assert.Equal("d_x", Op("d_x").ToFactoredString());
        // d_x x = x d_x + 1 (Leibniz rule; common practice).
        Assert.Equal("x*d_x + 1", Op("d_x*x").ToString());
        Assert.Equal("x^2*d_x^2 + 4*x*d_x + 2", Op("d_x^2*x^2").ToString());
    }
}
