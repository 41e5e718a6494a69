using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class RealSpanTests
{
    private static readonly GaussianRational I = GaussianRational.I;

    // Pauli matrices (common practice).
    private static readonly Matrix<GaussianRational> Sigma1 = Matrix.FromRows<GaussianRational>([0, 1], [1, 0]);
    private static readonly Matrix<GaussianRational> Sigma2 = Matrix.FromRows<GaussianRational>([0, -I], [I, 0]);
    private static readonly Matrix<GaussianRational> Sigma3 = Matrix.FromRows<GaussianRational>([1, 0], [0, -1]);

    [Fact]
    public void Real_span_of_i_sigma_over_2_is_su2_with_T_a_T_b_equal_minus_epsilon_T_c()
    {
        // Derivation: [σ_a, σ_b] = 2i ε_abc σ_c (common practice), so with T_a = i σ_a / 2:
        // [T_a, T_b] = (i/2)^2 2i ε_abc σ_c = -(i/2) ε_abc σ_c = -ε_abc T_c.
        var half = new GaussianRational(Rational.Zero, new Rational(1, 2));
        var su2 = RealLieAlgebras.RealSpanOfMatrices([half * Sigma1, half * Sigma2, half * Sigma3], ["T_1", "T_2", "T_3"]);
        Assert.Equal("-T_3", su2.Bracket(su2.Basis("T_1"), su2.Basis("T_2")).ToString());
        Assert.Equal("-T_1", su2.Bracket(su2.Basis("T_2"), su2.Basis("T_3")).ToString());
        Assert.Equal("-T_2", su2.Bracket(su2.Basis("T_3"), su2.Basis("T_1")).ToString());

        // K(T_a, T_b) = -2 δ_ab, compact (common practice for su(2) in this normalisation).
        Assert.Equal(Matrix<Rational>.Identity(3).Map(x => -2 * x), su2.KillingForm());
        Assert.True(su2.IsCompactSemisimple());
    }

    [Fact]
    public void Real_span_keeps_M_and_iM_independent_and_reports_real_dependencies()
    {
        var algebra = RealLieAlgebras.RealSpanOfMatrices([Sigma3, I * Sigma3, Sigma3 + I * Sigma3], ["A", "B", "C"]);
        Assert.Equal(["A", "B"], algebra.BasisNames);
        Assert.Contains("C = A + B", Assert.Single(algebra.Warnings));
    }

    [Fact]
    public void Hermitian_Pauli_matrices_have_non_real_structure_constants_and_the_error_says_so()
    {
        // [σ_1, σ_2] = 2i σ_3 lies in the complex span only.
        var error = Assert.Throws<ExactArgumentException>(() => RealLieAlgebras.RealSpanOfMatrices([Sigma1, Sigma2, Sigma3], ["s1", "s2", "s3"]));
        Assert.Contains("not real", error.Message);
        Assert.Contains("[s1, s2]", error.Message);
        Assert.Contains("2i s3", error.Message);
    }

    [Fact]
    public void Same_matrices_over_the_gaussian_rationals_give_the_complex_algebra_sl2C()
    {
        var complex = LieAlgebra<GaussianRational>.FromMatrices([Sigma1, Sigma2, Sigma3], ["s1", "s2", "s3"]);
        Assert.Equal("2i s3", complex.Bracket(complex.Basis("s1"), complex.Basis("s2")).ToString());
        Assert.True(complex.IsSimple);
    }

    [Fact]
    public void Real_algebra_generated_by_two_anti_hermitian_matrices_is_su2()
    {
        var half = new GaussianRational(Rational.Zero, new Rational(1, 2));
        var su2 = RealLieAlgebras.RealAlgebraGeneratedByMatrices([half * Sigma1, half * Sigma2], ["T_1", "T_2"]);
        Assert.Equal(3, su2.Dimension);
        Assert.Equal(new FormSignature(0, 3, 0), su2.KillingSignature());
    }

    [Fact]
    public void Complexification_of_su2_and_of_sl2R_are_both_simple_complex_algebras()
    {
        // Common practice: su(2) ⊗ C = sl(2, R) ⊗ C = sl(2, C).
        Assert.True(LieAlgebras.SpecialUnitary(2).Complexify().IsSimple);
        Assert.True(Samples.Sl2().Complexify().IsSimple);
    }
}
