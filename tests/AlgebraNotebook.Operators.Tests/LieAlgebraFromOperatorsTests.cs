using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Operators.Tests;

public class LieAlgebraFromOperatorsTests
{
    [Fact]
    public void Rotation_generators_span_a_compact_simple_algebra_of_dimension_three()
    {
        // Real basis e_x = y d_z - z d_y, e_y = z d_x - x d_z, e_z = x d_y - y d_x (e_k = i L_k / hbar): so(3) (common practice).
        var ring = CoordinateSystems.Cartesian<Rational>();
        var algebra = new OperatorSpan<Rational>([
            ("e_x", DifferentialOperator<Rational>.Parse(ring, "y*d_z - z*d_y")),
            ("e_y", DifferentialOperator<Rational>.Parse(ring, "z*d_x - x*d_z")),
            ("e_z", DifferentialOperator<Rational>.Parse(ring, "x*d_y - y*d_x")),
        ]).ToLieAlgebra("rotations");
        Assert.Equal(3, algebra.Dimension);
        Assert.Equal(new[] { "e_x", "e_y", "e_z" }, algebra.BasisNames);
        Assert.True(algebra.IsSimple);
        // so(3) is compact: its Killing form is negative definite (common practice).
        Assert.True(algebra.IsCompactSemisimple());
        Assert.Equal(new Rational(-1), algebra.StructureConstant(0, 1, 2));
    }

    [Fact]
    public void Heat_equation_symmetries_have_a_three_dimensional_radical()
    {
        // Olver, Example 2.41 (from memory): the six-dimensional algebra is sl(2) acting on the Heisenberg algebra
        // spanned by d_x, 2t d_x - x u d_u and u d_u, which is its radical.
        var ring = new CoefficientRingBuilder<Rational>("jet space (x, t, u) for algebra").Coordinates("x", "t", "u").Build();
        string[] fields = ["d_x", "d_t", "u*d_u", "x*d_x + 2*t*d_t", "2*t*d_x - x*u*d_u", "4*t*x*d_x + 4*t^2*d_t - (x^2 + 2*t)*u*d_u"];
        var algebra = new OperatorSpan<Rational>(fields.Select((f, k) => ($"v{k + 1}", DifferentialOperator<Rational>.Parse(ring, f))).ToList()).ToLieAlgebra();
        Assert.Equal(6, algebra.Dimension);
        Assert.False(algebra.IsSolvable);
        Assert.False(algebra.IsSemisimple);
        Assert.Equal(3, algebra.SolvableRadical().Count);

        // Levi decomposition: the radical is the (nilpotent) Heisenberg algebra and the Levi factor is sl(2, R),
        // type A1 with an indefinite Killing form (Olver, Example 2.41, from memory; sl(2, R) signature (2, 1) is common practice).
        var summary = algebra.Summary();
        Assert.Equal(3, summary.NilradicalDimension);
        Assert.Equal(3, summary.LeviFactorDimension);
        Assert.Equal(CartanType.Parse("A1"), summary.LeviFactorType);
        var levi = algebra.LeviDecomposition();
        var leviFactor = algebra.Subalgebra(levi.LeviFactor);
        var signature = leviFactor.KillingSignature();
        Assert.Equal((2, 1, 0), (signature.Positive, signature.Negative, signature.Zero));
    }

    [Fact]
    public void Oscillator_bilinears_give_the_compact_algebra_u3()
    {
        // Anti-Hermitian real basis of u(3) from E_jk = (x_j - d_j)(x_k + d_k) = 2 a_j^dagger a_k (common practice):
        // i E_kk, E_jk - E_kj, i (E_jk + E_kj). u(3) = u(1) + su(3) is compact with a one-dimensional centre.
        var ring = CoordinateSystems.Cartesian<GaussianRational>();
        string[] axes = ["x", "y", "z"];
        DifferentialOperator<GaussianRational> E(int j, int k) =>
            DifferentialOperator<GaussianRational>.Parse(ring, $"({axes[j]} - d_{axes[j]})*({axes[k]} + d_{axes[k]})");
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

        var table = new OperatorSpan<GaussianRational>(basis).StructureConstants();
        var complexTensor = table.ToTensor();
        var realTensor = new Rational[9, 9, 9];
        for (var a = 0; a < 9; a++)
        {
            for (var b = 0; b < 9; b++)
            {
                for (var c = 0; c < 9; c++)
                {
                    Assert.True(complexTensor[a, b, c].IsReal);
                    realTensor[a, b, c] = complexTensor[a, b, c].Real;
                }
            }
        }

        var u3 = LieAlgebra<Rational>.FromStructureConstants(table.BasisNames, realTensor, "u(3) from the oscillator");
        Assert.Equal(9, u3.Dimension);
        Assert.True(u3.IsCompact());
        Assert.False(u3.IsSemisimple);
        Assert.Single(u3.Center());
        // The complex algebra directly from the span (over Q(i)) has the same dimension.
        Assert.Equal(9, table.ToLieAlgebra().Dimension);

        // The traceless part is su(3): the Levi factor has dimension 8 and type A2 (common practice).
        var summary = u3.Summary();
        Assert.Equal(8, summary.LeviFactorDimension);
        Assert.Equal(CartanType.Parse("A2"), summary.LeviFactorType);

        // The oscillator level n is the symmetric irreducible (n, 0) of A2, of dimension (n+1)(n+2)/2: the degeneracy of
        // the isotropic three-dimensional oscillator (Sakurai, Modern Quantum Mechanics, problem on the 3D oscillator,
        // from memory). The states at level n are the monomials of degree n in three variables: counted directly here.
        for (var n = 0; n <= 10; n++)
        {
            var monomials = 0;
            for (var a = 0; a <= n; a++)
            {
                monomials += n - a + 1;
            }

            var irreducible = IrreducibleRepresentation.Of("A2", n, 0);
            Assert.Equal((n + 1) * (n + 2) / 2, monomials);
            Assert.Equal(monomials, (int)irreducible.Dimension);
        }
    }
}
