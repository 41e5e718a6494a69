using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Algebras.Tests.Enveloping;

public class CasimirEigenvalueTests
{
    [Fact]
    public void Killing_Casimir_of_sl2_acts_as_1_on_the_adjoint_and_3_8_on_C2()
    {
        // Adjoint: 1 in Killing normalisation (common practice; REFERENCES.md). C^2: physics value 3/4 (spin 1/2) divided by
        // the dual Coxeter number 2 (REFERENCES.md) = 3/8; also compared with the roots layer's value.
        var g = Samples.Sl2();
        var c = CasimirElements.QuadraticCasimir(g);
        Assert.Equal(Rational.One, CasimirElements.Eigenvalue(c, g.AdjointMatrices()));
        Assert.Equal(new Rational(3, 8), CasimirElements.Eigenvalue(c, EnvelopingSamples.Sl2Defining()));
        Assert.Equal(IrreducibleRepresentation.Of("A1", 1).QuadraticCasimir(CasimirNormalisation.Killing), new Rational(3, 8));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(5)]
    public void Killing_Casimir_of_sl2_on_V_m_is_m_times_m_plus_2_over_8(int m)
    {
        // On V(m): C = (1/8)(H^2 + 2H + 4FE) acts on the highest vector as (m^2 + 2m)/8 (Humphreys §7.2 module, derived),
        // and the roots layer's Killing-normalised value of A1 with label m must agree.
        var g = Samples.Sl2();
        var value = CasimirElements.Eigenvalue(CasimirElements.QuadraticCasimir(g), EnvelopingSamples.Sl2Irreducible(m));
        Assert.Equal(new Rational(m * (m + 2), 8), value);
        Assert.Equal(IrreducibleRepresentation.Of("A1", m).QuadraticCasimir(CasimirNormalisation.Killing), value);
    }

    [Theory]
    [InlineData("sl3")]
    [InlineData("sp4")]
    [InlineData("so5")]
    public void Killing_Casimir_acts_as_1_on_the_adjoint(string name)
    {
        // Killing normalisation: C2(adjoint) = 1 (common practice; REFERENCES.md), cross-checked with the roots layer's
        // IrreducibleRepresentation.QuadraticCasimir(Killing) of the highest root of the identified type.
        var g = QuadraticCasimirTests.Algebra(name);
        var c = CasimirElements.QuadraticCasimir(g);
        var value = CasimirElements.Eigenvalue(c, g.AdjointMatrices());
        Assert.Equal(Rational.One, value);
        var system = RootSystem.Of(CasimirElements.BasicInvariantDegrees(g).Type);
        Assert.Equal(IrreducibleRepresentation.Of(system, system.HighestRoot.AsWeight).QuadraticCasimir(CasimirNormalisation.Killing), value);
    }

    [Fact]
    public void Killing_Casimir_of_sl3_on_C3_is_4_9_as_the_roots_layer_says()
    {
        // su(3) fundamental: physics value (N^2 - 1)/(2N) = 4/3, divided by the dual Coxeter number 3 = 4/9 (REFERENCES.md).
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var value = CasimirElements.Eigenvalue(CasimirElements.QuadraticCasimir(g), EnvelopingSamples.Sl3Defining());
        Assert.Equal(new Rational(4, 9), value);
        Assert.Equal(IrreducibleRepresentation.Of("A2", 1, 0).QuadraticCasimir(CasimirNormalisation.Killing), value);
        Assert.Equal(IrreducibleRepresentation.Of("A2", 0, 1).QuadraticCasimir(CasimirNormalisation.Killing),
            CasimirElements.Eigenvalue(CasimirElements.QuadraticCasimir(g), EnvelopingSamples.Sl3Defining().Select(m => -m.Transpose()).ToArray()));
    }

    [Fact]
    public void Killing_Casimir_of_sp4_on_C4_matches_the_roots_layer_value_of_the_first_fundamental()
    {
        // sp(4) on C^4 is V(omega_1) of C2 (Bourbaki Plate III numbering); its Killing-normalised value is
        // (2n + 1)/(4(n + 1)) = 5/12 for n = 2 (derived from the trace-form value below and K = 2(n + 1) tr; from memory).
        var g = LieAlgebras.Symplectic<Rational>(2);
        var value = CasimirElements.Eigenvalue(CasimirElements.QuadraticCasimir(g), EnvelopingSamples.Sp4Defining());
        Assert.Equal(new Rational(5, 12), value);
        Assert.Equal(IrreducibleRepresentation.Of("C2", 1, 0).QuadraticCasimir(CasimirNormalisation.Killing), value);
    }

    [Theory]
    [InlineData("sl2")]
    [InlineData("sl3")]
    [InlineData("sp4")]
    public void Trace_form_Casimir_acts_as_dim_g_over_dim_V_on_its_own_representation(string name)
    {
        // tr(C_rho) = sum_ij B^ij B_ij = dim g, so on an irreducible V the scalar is dim g / dim V (common practice).
        var g = QuadraticCasimirTests.Algebra(name);
        var rho = name switch
        {
            "sl2" => EnvelopingSamples.Sl2Defining(),
            "sl3" => EnvelopingSamples.Sl3Defining(),
            _ => EnvelopingSamples.Sp4Defining(),
        };
        var value = CasimirElements.Eigenvalue(CasimirElements.QuadraticCasimir(g, rho), rho);
        Assert.Equal(new Rational(g.Dimension, rho[0].RowCount), value);
    }

    [Fact]
    public void Eigenvalue_on_a_reducible_representation_reports_the_non_scalar_entry()
    {
        // C^2 + trivial: the Casimir acts as 3/8 on C^2 and 0 on the trivial part, so the image is not scalar.
        var g = Samples.Sl2();
        var rho = EnvelopingSamples.Sl2Defining()
            .Select(m => Exact.Matrices.Matrix<Rational>.DirectSum(m, Exact.Matrices.Matrix<Rational>.Zero(1, 1))).ToArray();
        var error = Assert.Throws<ExactArgumentException>(() => CasimirElements.Eigenvalue(CasimirElements.QuadraticCasimir(g), rho));
        Assert.Contains("not a scalar matrix", error.Message);
        Assert.Contains("entry (3, 3)", error.Message);
    }
}
