using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Operators.Tests;

public class HarmonicOscillatorTests
{
    private static readonly CoefficientRing<GaussianRational> Ring =
        new CoefficientRingBuilder<GaussianRational>("oscillator (x, y, z)").Coordinates("x", "y", "z").Build();

    private static readonly string[] Axes = ["x", "y", "z"];

    private static DifferentialOperator<GaussianRational> Op(string text) => DifferentialOperator<GaussianRational>.Parse(Ring, text);

    // Units hbar = m = omega = 1, a_i = (x_i + d_i)/sqrt2, so 2 a_i^dagger a_j = (x_i - d_i)(x_j + d_j) (common practice).
    private static DifferentialOperator<GaussianRational> E(int i, int j) =>
        Op($"({Axes[i]} - d_{Axes[i]})*({Axes[j]} + d_{Axes[j]})");

    private static readonly DifferentialOperator<GaussianRational> H =
        Op("(-d_x^2 + x^2 - d_y^2 + y^2 - d_z^2 + z^2)/2");

    [Fact]
    public void Every_bilinear_a_dagger_a_commutes_with_the_isotropic_hamiltonian()
    {
        // [H, a_i^dagger a_j] = 0 for the isotropic oscillator (Sakurai, Modern Quantum Mechanics, ch. 2-4; common practice).
        for (var i = 0; i < 3; i++)
        {
            for (var j = 0; j < 3; j++)
            {
                var check = E(i, j).CommutesWith(H);
                Assert.True(check.Commutes, $"E({i},{j}): {check}");
            }
        }

        // A single a_x^dagger = (x - d_x)/sqrt2 raises the energy: [H, x - d_x] = x - d_x (common practice).
        var raise = Op("x - d_x");
        Assert.Equal(raise, raise.CommutesWith(H).Commutator);
    }

    [Fact]
    public void Bilinears_satisfy_the_gl3_commutation_relations()
    {
        // [a_i^+ a_j, a_k^+ a_l] = delta_jk a_i^+ a_l - delta_il a_k^+ a_j (common practice), so with E_ij = 2 a_i^+ a_j:
        // [E_ij, E_kl] = 2 (delta_jk E_il - delta_il E_kj).
        for (var i = 0; i < 3; i++)
        {
            for (var j = 0; j < 3; j++)
            {
                for (var k = 0; k < 3; k++)
                {
                    for (var l = 0; l < 3; l++)
                    {
                        var expected = DifferentialOperator<GaussianRational>.Zero(Ring);
                        if (j == k)
                        {
                            expected += E(i, l);
                        }

                        if (i == l)
                        {
                            expected -= E(k, j);
                        }

                        Assert.Equal((GaussianRational)2 * expected, DifferentialOperator<GaussianRational>.Commutator(E(i, j), E(k, l)));
                    }
                }
            }
        }
    }

    [Fact]
    public void Anti_hermitian_combinations_close_into_u3_with_real_structure_constants()
    {
        // Real basis of u(3) (common practice): i E_kk, E_jk - E_kj and i (E_jk + E_kj) for j < k; each is anti-self-adjoint
        // for the flat measure dx dy dz.
        var i = GaussianRational.I;
        var basis = new List<(string, DifferentialOperator<GaussianRational>)>();
        for (var k = 0; k < 3; k++)
        {
            basis.Add(($"D{k + 1}", i * E(k, k)));
        }

        for (var j = 0; j < 3; j++)
        {
            for (var k = j + 1; k < 3; k++)
            {
                basis.Add(($"A{j + 1}{k + 1}", E(j, k) - E(k, j)));
                basis.Add(($"S{j + 1}{k + 1}", i * (E(j, k) + E(k, j))));
            }
        }

        foreach (var (name, op) in basis)
        {
            Assert.Equal(-op, op.FormalAdjoint());
        }

        var table = new OperatorSpan<GaussianRational>(basis).StructureConstants();
        Assert.Equal(9, table.Dimension);
        var constants = table.ToTensor();
        foreach (var c in constants)
        {
            Assert.True(c.IsReal, $"structure constant {c} is not real");
        }

        // [E_12 - E_21, i(E_12 + E_21)] = 2i [E_12, E_21] = 4i (E_11 - E_22) = 4 D1 - 4 D2 (from the gl(3) relations above).
        Assert.Equal("[A12, S12] = 4*D1 - 4*D2", table.BracketText(3, 4));
    }

    [Fact]
    public void On_the_eigenspace_of_H_the_number_operator_is_E_minus_three_halves()
    {
        var ring = new CoefficientRingBuilder<GaussianRational>("oscillator with energy").Coordinates("x", "y", "z").Parameters("E").Build();
        var h = DifferentialOperator<GaussianRational>.Parse(ring, "(-d_x^2 + x^2 - d_y^2 + y^2 - d_z^2 + z^2)/2");
        var number = DifferentialOperator<GaussianRational>.Parse(ring, "((x - d_x)*(x + d_x) + (y - d_y)*(y + d_y) + (z - d_z)*(z + d_z))/2");
        var eigenspace = new Eigenspace<GaussianRational>("H", h, ring.Element("E"));
        var reduced = eigenspace.Simplify(number);

        // N = sum a_i^dagger a_i = H - 3/2 (common practice), so N = E - 3/2 on the eigenspace H = E.
        Assert.Equal(DifferentialOperator<GaussianRational>.Parse(ring, "E - 3/2"), reduced.Operator);
        Assert.Equal("E - 3/2 (on the eigenspace H = E)", reduced.ToString());
        // Without the declaration N is a second-order operator.
        Assert.Equal(2, number.Order);
    }
}
