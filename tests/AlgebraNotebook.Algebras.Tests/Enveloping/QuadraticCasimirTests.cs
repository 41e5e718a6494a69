using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests.Enveloping;

public class QuadraticCasimirTests
{
    [Fact]
    public void Killing_Casimir_of_sl2_is_one_eighth_of_H2_plus_2EF_plus_2FE()
    {
        // Killing form of sl(2): K(H,H) = 8, K(E,F) = 4 (Humphreys, Introduction to Lie Algebras, §6.2 / §22.3, from memory),
        // so C = H^2/8 + (E F + F E)/4. With F E = E F - H (PBW order H, E, F): C = (1/8)(H^2 + 4 E F - 2 H).
        var g = Samples.Sl2();
        var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
        var h = u.Generator("H");
        var e = u.Generator("E");
        var f = u.Generator("F");
        var c = CasimirElements.QuadraticCasimir(g);
        Assert.Equal(new Rational(1, 8) * (h * h + (Rational)2 * (e * f) + (Rational)2 * (f * e)), c);
        Assert.Equal(new Rational(1, 8) * (h * h + (Rational)4 * (e * f) - (Rational)2 * h), c);
        Assert.Equal("1/8 H^2 + 1/2 E F - 1/4 H", c.ToString());
    }

    [Fact]
    public void Killing_Casimir_of_sl2_in_the_order_H_F_E_is_one_eighth_of_H2_plus_2H_plus_4FE()
    {
        // Same element written with F before E: E F = F E + H gives (1/8)(H^2 + 4 F E + 2 H) (Humphreys §22.3 form, from memory; derived).
        var g = LieAlgebra<Rational>.FromCommutatorTable("""
            basis: H, F, E
            [H, E] = 2 E
            [H, F] = -2 F
            [E, F] = H
            """);
        var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
        var h = u.Generator("H");
        var fe = u.Generator("F") * u.Generator("E");
        Assert.Equal(new Rational(1, 8) * (h * h + (Rational)4 * fe + (Rational)2 * h), CasimirElements.QuadraticCasimir(g));
        Assert.Equal("1/8 H^2 + 1/2 F E + 1/4 H", CasimirElements.QuadraticCasimir(g).ToString());
    }

    [Fact]
    public void Killing_Casimir_of_so3_is_minus_one_half_of_the_sum_of_squares()
    {
        // so(3) with [L_x, L_y] = L_z cyclic: K(L_i, L_j) = -2 delta_ij, so C = -(1/2)(L_x^2 + L_y^2 + L_z^2) (derived; common practice).
        var g = Samples.So3();
        var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
        var expected = new Rational(-1, 2) * (u.Monomial(2, 0, 0) + u.Monomial(0, 2, 0) + u.Monomial(0, 0, 2));
        Assert.Equal(expected, CasimirElements.QuadraticCasimir(g));
    }

    [Fact]
    public void Trace_form_Casimir_of_sl2_on_C2_is_four_times_the_Killing_Casimir()
    {
        // K = 2n tr(x y) on sl(n) (Humphreys §6.2, exercise; from memory; here n = 2), so C_tr = 4 C_K.
        var g = Samples.Sl2();
        var traceCasimir = CasimirElements.QuadraticCasimir(g, EnvelopingSamples.Sl2Defining());
        Assert.Equal((Rational)4 * CasimirElements.QuadraticCasimir(g), traceCasimir);
    }

    public static TheoryData<string> SemisimpleAlgebras => new() { "sl2", "so3", "sl3", "sp4", "so5" };

    [Theory]
    [MemberData(nameof(SemisimpleAlgebras))]
    public void Killing_Casimir_is_central(string name)
    {
        // Casimir elements are central (Humphreys, Introduction to Lie Algebras, §6.2 and §23.2): basis check plus random
        // elements of U(g) of degree <= 2, fixed seed.
        var g = Algebra(name);
        var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
        var c = CasimirElements.QuadraticCasimir(g);
        var check = CasimirElements.CheckCentral(c);
        Assert.True(check.IsCentral, $"{name}: {check}");
        Assert.Equal(2, c.Degree);
        var random = new Random(2024);
        for (var t = 0; t < 3 * EnvelopingSamples.Iterations; t++)
        {
            var x = EnvelopingSamples.RandomElement(u, random, 2, 2);
            Assert.True(EnvelopingElement<Rational>.Commutator(c, x).IsZero, $"{name}: [C, {x}] is not 0");
        }
    }

    [Fact]
    public void Trace_form_Casimirs_of_sl3_and_sp4_are_central()
    {
        // Any invariant non-degenerate form gives a central element (Humphreys, Introduction to Lie Algebras, §6.2).
        Assert.True(CasimirElements.CheckCentral(CasimirElements.QuadraticCasimir(Algebra("sl3"), EnvelopingSamples.Sl3Defining())).IsCentral);
        Assert.True(CasimirElements.CheckCentral(CasimirElements.QuadraticCasimir(Algebra("sp4"), EnvelopingSamples.Sp4Defining())).IsCentral);
    }

    [Fact]
    public void Killing_Casimir_of_complexified_so3_is_central_and_acts_as_1_on_the_adjoint()
    {
        // Over Q(i) the same construction works (Killing normalisation, common practice).
        var g = RealLieAlgebras.Complexify(Samples.So3());
        var c = CasimirElements.QuadraticCasimir(g);
        Assert.True(CasimirElements.CheckCentral(c).IsCentral);
        Assert.Equal(GaussianRational.One, CasimirElements.Eigenvalue(c, g.AdjointMatrices()));
    }

    [Fact]
    public void Non_central_element_reports_the_first_non_zero_commutator()
    {
        // [H, E F] = [H, E] F + E [H, F] = 2 E F - 2 E F = 0, but [E, E F] = E [E, F] = E H = H E - 2 E (derived).
        var u = UniversalEnvelopingAlgebra<Rational>.Of(Samples.Sl2());
        var ef = u.Generator("E") * u.Generator("F");
        var check = CasimirElements.CheckCentral(ef);
        Assert.False(check.IsCentral);
        Assert.Equal("E", check.FailingBasisName);
        Assert.Equal(u.Generator("H") * u.Generator("E") - (Rational)2 * u.Generator("E"), check.Commutator);
    }

    [Fact]
    public void Casimir_of_a_non_semisimple_algebra_names_the_radical_of_the_Killing_form()
    {
        // gl(2): the Killing form vanishes on the identity, the centre (common practice), so its radical has dimension 1.
        var gl2 = LieAlgebras.GeneralLinear<Rational>(2);
        var error = Assert.Throws<ExactArgumentException>(() => CasimirElements.QuadraticCasimir(gl2));
        Assert.Contains("Killing form", error.Message);
        Assert.Contains("radical has dimension 1", error.Message);
        Assert.Contains("not semisimple", error.Message);
    }

    [Fact]
    public void Trace_Casimir_from_a_non_faithful_representation_is_rejected()
    {
        // The zero representation of sl(2) has a zero trace form.
        var g = Samples.Sl2();
        var zero = Enumerable.Repeat(Exact.Matrices.Matrix<Rational>.Zero(2, 2), 3).ToArray();
        var error = Assert.Throws<ExactArgumentException>(() => CasimirElements.QuadraticCasimir(g, zero));
        Assert.Contains("radical has dimension 3", error.Message);
    }

    [Fact]
    public void Trace_Casimir_with_the_wrong_number_of_matrices_is_rejected()
    {
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var error = Assert.Throws<ExactArgumentException>(() => CasimirElements.QuadraticCasimir(g, EnvelopingSamples.Sl2Defining()));
        Assert.Contains("needs 8 matrices", error.Message);
    }

    internal static LieAlgebra<Rational> Algebra(string name) => name switch
    {
        "sl2" => Samples.Sl2(),
        "so3" => Samples.So3(),
        "sl3" => LieAlgebras.SpecialLinear<Rational>(3),
        "sp4" => LieAlgebras.Symplectic<Rational>(2),
        "so5" => LieAlgebras.Orthogonal<Rational>(5),
        _ => throw new ArgumentException(name),
    };
}
