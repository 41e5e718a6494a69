using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests.Enveloping;

public class CubicCasimirTests
{
    [Fact]
    public void Cubic_Casimir_of_sl3_from_symmetrised_traces_is_central()
    {
        // The symmetrised-trace element is central (invariant symmetric tensor; Humphreys §23.2 idea; common practice for su(3)).
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var c3 = CasimirElements.CubicCasimir(g, EnvelopingSamples.Sl3Defining());
        var check = CasimirElements.CheckCentral(c3);
        Assert.True(check.IsCentral, check.ToString());
        Assert.Equal(3, c3.Degree);
    }

    [Fact]
    public void Cubic_Casimir_of_sl3_is_independent_of_the_quadratic_one()
    {
        // A polynomial in C2 has only even-degree leading parts, so a non-zero degree-3 part already rules that out; stronger:
        // the degree-3 part is not the symmetric product of the degree-2 part of C2 with a Lie element (PBW: leading parts
        // multiply commutatively; Humphreys §17.3, from memory), checked by a rank computation.
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
        var c2 = CasimirElements.QuadraticCasimir(g);
        var top = CasimirElements.CubicCasimir(g, EnvelopingSamples.Sl3Defining()).HomogeneousPart(3);
        Assert.False(top.IsZero);
        var products = Enumerable.Range(0, g.Dimension).Select(i => (c2 * u.Generator(i)).HomogeneousPart(3)).ToList();
        var monomials = products.Append(top).SelectMany(p => p.Terms.Select(t => t.Monomial)).Distinct().ToArray();
        Rational[] Vector(EnvelopingElement<Rational> x) =>
            monomials.Select(m => x.Coefficient(m.Exponents.ToArray())).ToArray();
        var without = LinearAlgebra.Rank(Matrix<Rational>.FromRows(products.Select(Vector).ToArray()));
        var with = LinearAlgebra.Rank(Matrix<Rational>.FromRows(products.Append(top).Select(Vector).ToArray()));
        Assert.Equal(without + 1, with);
    }

    [Fact]
    public void Cubic_Casimir_changes_sign_on_the_dual_representation_and_vanishes_on_the_adjoint()
    {
        // The cubic invariant of su(3) is odd under conjugation: C3(3bar) = -C3(3), C3(8) = 0 (common practice).
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var rho = EnvelopingSamples.Sl3Defining();
        var c3 = CasimirElements.CubicCasimir(g, rho);
        var onDefining = CasimirElements.Eigenvalue(c3, rho);
        var onDual = CasimirElements.Eigenvalue(c3, rho.Select(m => -m.Transpose()).ToArray());
        Assert.False(onDefining.IsZero);
        Assert.Equal(-onDefining, onDual);
        Assert.True(CasimirElements.Eigenvalue(c3, g.AdjointMatrices()).IsZero);
    }

    [Fact]
    public void Cubic_Casimir_ratio_between_Sym2_C3_and_C3_is_7_2()
    {
        // su(3) cubic Casimir on (p, q) is proportional to (p - q)(2p + q + 3)(p + 2q + 3) (common practice, from memory):
        // (1, 0) gives 20 and (2, 0) gives 70, a normalisation-free ratio 7/2. The quadratic one on Sym^2 C^3 = V(2, 0)
        // must match the roots layer (Killing normalisation).
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var rho = EnvelopingSamples.Sl3Defining();
        var sym2 = EnvelopingSamples.SymmetricSquare(rho);
        var c3 = CasimirElements.CubicCasimir(g, rho);
        Assert.Equal(new Rational(7, 2), CasimirElements.Eigenvalue(c3, sym2) / CasimirElements.Eigenvalue(c3, rho));
        Assert.Equal(
            Roots.Representations.IrreducibleRepresentation.Of("A2", 2, 0).QuadraticCasimir(Roots.Representations.CasimirNormalisation.Killing),
            CasimirElements.Eigenvalue(CasimirElements.QuadraticCasimir(g), sym2));
    }

    [Fact]
    public void Cubic_trace_Casimir_of_sl2_vanishes()
    {
        // sl(2) has no cubic invariant (degrees 2 only; Humphreys, Reflection Groups, Table 3.1): tr of odd products of Pauli-type matrices symmetrise to 0.
        Assert.True(CasimirElements.CubicCasimir(Samples.Sl2(), EnvelopingSamples.Sl2Defining()).IsZero);
    }
}
