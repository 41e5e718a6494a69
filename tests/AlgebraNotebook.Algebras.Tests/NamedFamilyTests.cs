using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class NamedFamilyTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void Dimensions_of_the_classical_families_match_the_standard_formulas(int n)
    {
        // Common practice: dim gl(n) = n^2, sl(n) = n^2 - 1, so(n) = n(n-1)/2, sp(2n) = n(2n+1), su(n) = n^2 - 1,
        // u(n) = n^2, h(2n+1) = 2n + 1, e(n) = n(n+1)/2.
        Assert.Equal(n * n, LieAlgebras.GeneralLinear<Rational>(n).Dimension);
        Assert.Equal(n * (2 * n + 1), LieAlgebras.Symplectic<Rational>(n).Dimension);
        Assert.Equal(n * n, LieAlgebras.Unitary(n).Dimension);
        Assert.Equal(2 * n + 1, LieAlgebras.Heisenberg<Rational>(n).Dimension);
        Assert.Equal(n * (n + 1) / 2, LieAlgebras.Euclidean<Rational>(n).Dimension);
        var m = n + 1;
        Assert.Equal(m * m - 1, LieAlgebras.SpecialLinear<Rational>(m).Dimension);
        Assert.Equal(m * (m - 1) / 2, LieAlgebras.Orthogonal<Rational>(m).Dimension);
        Assert.Equal(m * m - 1, LieAlgebras.SpecialUnitary(m).Dimension);
        Assert.Equal(m * (m - 1) / 2, LieAlgebras.Orthogonal<Rational>(m - 1, 1).Dimension);
        Assert.Equal(m * m - 1, LieAlgebras.SpecialUnitary(m - 1, 1).Dimension);
    }

    [Fact]
    public void Named_families_have_no_dependency_warnings()
    {
        Assert.Empty(LieAlgebras.SpecialUnitary(3).Warnings);
        Assert.Empty(LieAlgebras.Symplectic<Rational>(2).Warnings);
        Assert.Empty(LieAlgebras.Galilei<Rational>().Warnings);
    }

    [Fact]
    public void Documented_brackets_of_sl2_so3_heisenberg_and_galilei_hold()
    {
        var sl2 = LieAlgebras.SpecialLinear<Rational>(2);
        Assert.Equal("2 E_12", sl2.Bracket(sl2.Basis("H_1"), sl2.Basis("E_12")).ToString());
        Assert.Equal("H_1", sl2.Bracket(sl2.Basis("E_12"), sl2.Basis("E_21")).ToString());

        var so3 = LieAlgebras.Orthogonal<Rational>(3);
        Assert.Equal("-L_23", so3.Bracket(so3.Basis("L_12"), so3.Basis("L_13")).ToString());

        var h = LieAlgebras.Heisenberg<Rational>(2);
        Assert.Equal("Z", h.Bracket(h.Basis("X_2"), h.Basis("Y_2")).ToString());
        Assert.True(h.Bracket(h.Basis("X_1"), h.Basis("Y_2")).IsZero);

        // Galilei algebra (common practice): [J_a, J_b] = ε_abc J_c, [J_a, K_b] = ε_abc K_c, [K_a, H] = P_a, [K_a, P_b] = 0.
        var g = LieAlgebras.Galilei<Rational>();
        Assert.Equal("J_3", g.Bracket(g.Basis("J_1"), g.Basis("J_2")).ToString());
        Assert.Equal("K_1", g.Bracket(g.Basis("J_2"), g.Basis("K_3")).ToString());
        Assert.Equal("P_2", g.Bracket(g.Basis("K_2"), g.Basis("H")).ToString());
        Assert.True(g.Bracket(g.Basis("K_1"), g.Basis("P_1")).IsZero);
    }

    [Fact]
    public void Symplectic_sp2_is_isomorphic_to_sl2_by_its_Killing_signature()
    {
        // Common practice: sp(2, R) = sl(2, R), split real form, Killing signature (2, 1, 0).
        Assert.Equal(new FormSignature(2, 1, 0), LieAlgebras.Symplectic<Rational>(1).KillingSignature());
        Assert.Equal(new FormSignature(2, 1, 0), LieAlgebras.SpecialLinear<Rational>(2).KillingSignature());
    }

    [Fact]
    public void Compact_real_forms_have_negative_definite_Killing_forms()
    {
        // Common practice: su(n), so(n) (n >= 3) are compact; so(3,1), su(2,1), sl(n,R), sp(2n,R) are not.
        Assert.True(LieAlgebras.SpecialUnitary(3).IsCompactSemisimple());
        Assert.True(LieAlgebras.Orthogonal<Rational>(4).IsCompactSemisimple());
        Assert.False(LieAlgebras.Orthogonal<Rational>(3, 1).IsCompactSemisimple());
        Assert.False(LieAlgebras.SpecialUnitary(2, 1).IsCompactSemisimple());
        Assert.True(LieAlgebras.Unitary(2).IsCompact());
        Assert.False(LieAlgebras.Unitary(2).IsSemisimple);
        Assert.False(LieAlgebras.Heisenberg<Rational>(1).IsCompact());
    }

    [Fact]
    public void Killing_signature_of_split_forms_is_rank_plus_positive_roots_versus_positive_roots()
    {
        // Common practice: for a split real form, K is positive on the Cartan subalgebra and hyperbolic on each pair of
        // root spaces, so the signature is (rank + N, N, 0) with N the number of positive roots: sl(3, R) (2 + 3, 3).
        Assert.Equal(new FormSignature(5, 3, 0), LieAlgebras.SpecialLinear<Rational>(3).KillingSignature());
        Assert.Equal(new FormSignature(6, 4, 0), LieAlgebras.Symplectic<Rational>(2).KillingSignature());

        // so(p, q): the compact part so(p) + so(q) is negative, the boosts positive: so(3,1) gives (3, 3, 0).
        Assert.Equal(new FormSignature(3, 3, 0), LieAlgebras.Orthogonal<Rational>(3, 1).KillingSignature());
    }

    [Fact]
    public void Too_small_sizes_are_rejected_with_the_parameter_named()
    {
        var error = Assert.Throws<ExactArgumentException>(() => LieAlgebras.SpecialLinear<Rational>(1));
        Assert.Contains("n = 1", error.Message);
        Assert.Throws<ExactArgumentException>(() => LieAlgebras.Orthogonal<Rational>(1, 0));
        Assert.Throws<ExactArgumentException>(() => LieAlgebras.Orthogonal<Rational>(-1, 3));
    }

    [Fact]
    public void Direct_sum_renames_clashing_basis_names_and_keeps_summands_commuting()
    {
        var sum = LieAlgebras.DirectSum(Samples.Sl2(), Samples.Sl2());
        Assert.Equal(["H", "E", "F", "H'", "E'", "F'"], sum.BasisNames);
        Assert.True(sum.Bracket(sum.Basis("E"), sum.Basis("F'")).IsZero);
        Assert.Equal("H'", sum.Bracket(sum.Basis("E'"), sum.Basis("F'")).ToString());
        Assert.Equal(2, sum.SimpleIdeals().Count);
    }

    [Fact]
    public void Semidirect_sum_of_so3_with_its_vector_representation_is_e3()
    {
        var so3 = Samples.So3();

        // ad of so(3) on R^3 in the basis L_x, L_y, L_z: the vector representation (common practice).
        var action = so3.AdjointMatrices();
        var r3 = LieAlgebra<Rational>.FromCommutatorTable("basis: P_x, P_y, P_z");
        var e3 = LieAlgebras.SemidirectSum(so3, r3, action);
        Assert.Equal(6, e3.Dimension);
        Assert.Equal("P_z", e3.Bracket(e3.Basis("Lx"), e3.Basis("P_y")).ToString());
        Assert.Equal(3, e3.SolvableRadical().Count);
        Assert.Equal(LieAlgebras.Euclidean<Rational>(3).KillingSignature(), e3.KillingSignature());
    }

    [Fact]
    public void Semidirect_sum_rejects_an_action_that_is_not_a_derivation()
    {
        var so3 = Samples.So3();
        var h3 = LieAlgebras.Heisenberg<Rational>(1);

        // The identity map is not a derivation of the Heisenberg algebra: D[X, Y] = Z but [DX, Y] + [X, DY] = 2 Z.
        var identity = Exact.Matrices.Matrix<Rational>.Identity(3);
        var error = Assert.Throws<ExactArgumentException>(() => LieAlgebras.SemidirectSum(so3, h3, [identity, identity, identity]));
        Assert.Contains("not a derivation", error.Message);
        Assert.Contains("(X_1, Y_1)", error.Message);
    }
}
