using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots.Representations;
using AlgebraNotebook.Roots.Representations.Matrices;

namespace AlgebraNotebook.Algebras.Tests.Enveloping;

public class HigherCasimirCrossCheckTests
{
    // V(p, q) of sl(3) in the basis of LieAlgebras.SpecialLinear (H_1, H_2, then E_ij row-major), from the roots layer's
    // Chevalley generators: E_12 = e_1, E_23 = e_2, E_13 = [e_1, e_2], E_21 = f_1, E_32 = f_2, E_31 = [f_2, f_1]
    // (the defining matrices satisfy the same relations; Humphreys, Introduction to Lie Algebras, 7.2 and 25.1, common practice).
    private static Matrix<Rational>[] Sl3Irreducible(int p, int q)
    {
        var m = RepresentationMatrices.Of("A2", p, q);
        var e1 = m.E(1);
        var e2 = m.E(2);
        var f1 = m.F(1);
        var f2 = m.F(2);
        return [m.H(1), m.H(2), e1, e1 * e2 - e2 * e1, f1, e2, f2 * f1 - f1 * f2, f2];
    }

    [Fact]
    public void Enveloping_cubic_Casimir_is_proportional_to_the_roots_layer_degree_three_eigenvalue()
    {
        // The symmetrised-trace cubic Casimir of the enveloping algebra and the Harish-Chandra power sum of degree 3 over the 3
        // must agree up to one constant on every V(p, q); both are proportional to (p - q)(2p + q + 3)(p + 2q + 3)
        // (common practice for su(3), from memory).
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var c3 = CasimirElements.CubicCasimir(g, EnvelopingSamples.Sl3Defining());
        Rational? ratio = null;
        foreach (var (p, q) in new[] { (1, 0), (0, 1), (2, 0), (1, 1), (0, 2), (2, 1), (3, 0) })
        {
            var onMatrices = CasimirElements.Eigenvalue(c3, Sl3Irreducible(p, q));
            var harishChandra = IrreducibleRepresentation.Of("A2", p, q).HigherCasimir(3);
            var published = new Rational((p - q) * (2 * p + q + 3) * (p + 2 * q + 3));
            Assert.Equal(harishChandra.IsZero, onMatrices.IsZero);
            if (harishChandra.IsZero)
            {
                continue;
            }

            ratio ??= onMatrices / harishChandra;
            Assert.Equal(ratio, onMatrices / harishChandra);
            Assert.Equal(ratio / 9, onMatrices / published);
        }

        Assert.NotNull(ratio);
    }

    [Fact]
    public void Defining_representation_rebuilt_from_roots_matrices_matches_the_sample()
    {
        // The translation of the Chevalley generators into the E_ij basis reproduces the defining matrices exactly (common practice).
        Assert.Equal(EnvelopingSamples.Sl3Defining(), Sl3Irreducible(1, 0));
    }
}
