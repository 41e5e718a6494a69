using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class StructureTests
{
    [Fact]
    public void Sl2_and_so3_are_simple()
    {
        // Common practice: sl(2) and so(3) are simple (Humphreys §2.1 for sl(2)).
        Assert.True(Samples.Sl2().IsSimple);
        Assert.True(Samples.So3().IsSimple);
        Assert.True(LieAlgebras.SpecialLinear<GaussianRational>(3).IsSimple);
    }

    [Fact]
    public void So31_is_semisimple_and_simple_as_a_real_algebra_but_not_after_complexification()
    {
        // Common practice: so(3,1) = sl(2, C) as a real algebra is simple; its complexification is sl(2,C) + sl(2,C).
        var lorentz = LieAlgebras.Orthogonal<Rational>(3, 1);
        Assert.True(lorentz.IsSemisimple);
        Assert.True(lorentz.IsSimple);
        var complex = lorentz.Complexify();
        Assert.Equal([3, 3], complex.SimpleIdeals().Select(i => i.Count));
    }

    [Fact]
    public void So4_splits_into_two_commuting_simple_ideals_of_dimension_3()
    {
        // Common practice: so(4) = so(3) + so(3).
        var so4 = LieAlgebras.Orthogonal<Rational>(4);
        var ideals = so4.SimpleIdeals();
        Assert.Equal(2, ideals.Count);
        Assert.All(ideals, i => Assert.Equal(3, i.Count));
        Assert.All(ideals, i => Assert.True(so4.IsIdeal(i)));
        foreach (var x in ideals[0])
        {
            foreach (var y in ideals[1])
            {
                Assert.True(x.Bracket(y).IsZero, $"[{x}, {y}] should vanish");
            }
        }

        Assert.All(ideals, i => Assert.Equal(new FormSignature(0, 3, 0), so4.Subalgebra(i).KillingSignature()));
    }

    [Fact]
    public void Heisenberg_algebra_is_nilpotent_with_center_Z()
    {
        // Common practice: h(2n+1) is 2-step nilpotent with centre spanned by Z.
        var h = LieAlgebras.Heisenberg<Rational>(2);
        Assert.True(h.IsNilpotent);
        Assert.True(h.IsSolvable);
        Assert.False(h.IsAbelian);
        Assert.False(h.IsSemisimple);
        Assert.Equal([h.Basis("Z")], h.Center());
        Assert.Equal(3, h.LowerCentralSeries().Count);
        Assert.Equal([0, 1, 5], h.UpperCentralSeries().Select(s => s.Count));
        Assert.Equal(5, h.Nilradical().Count);
        Assert.True(h.KillingForm().IsZero);
    }

    [Fact]
    public void E3_is_neither_solvable_nor_semisimple_with_radical_the_translations_and_Levi_factor_so3()
    {
        // Common practice: e(3) = so(3) ⋉ R^3.
        var e3 = LieAlgebras.Euclidean<Rational>(3);
        Assert.False(e3.IsSolvable);
        Assert.False(e3.IsSemisimple);
        var translations = e3.Span([e3.Basis("P_1"), e3.Basis("P_2"), e3.Basis("P_3")]);
        Assert.Equal(translations, e3.SolvableRadical());
        Assert.Equal(translations, e3.Nilradical());

        var levi = e3.LeviDecomposition();
        Assert.Equal(translations, levi.Radical);
        Assert.Equal(3, levi.LeviFactor.Count);
        Assert.True(e3.IsSubalgebra(levi.LeviFactor));
        var factor = e3.Subalgebra(levi.LeviFactor);

        // so(3) is the compact simple algebra of dimension 3: negative definite Killing form (common practice).
        Assert.Equal(new FormSignature(0, 3, 0), factor.KillingSignature());
        Assert.True(factor.IsSimple);
    }

    [Fact]
    public void Galilei_algebra_has_a_7_dimensional_solvable_radical_and_Levi_factor_so3()
    {
        // Common practice: Galilei = so(3) ⋉ (boosts + translations + time translation).
        var g = LieAlgebras.Galilei<Rational>();
        var levi = g.LeviDecomposition();
        var expectedRadical = g.Span(new[] { "K_1", "K_2", "K_3", "P_1", "P_2", "P_3", "H" }.Select(g.Basis));
        Assert.Equal(expectedRadical, levi.Radical);
        Assert.Equal(3, levi.LeviFactor.Count);
        var factor = g.Subalgebra(levi.LeviFactor);
        Assert.Equal(new FormSignature(0, 3, 0), factor.KillingSignature());

        // The radical span{K, P, H} is nilpotent ([K_a, H] = P_a, P central in it), so it is also the nilradical.
        var radical = g.Subalgebra(levi.Radical);
        Assert.True(radical.IsNilpotent);
        Assert.False(radical.IsAbelian);
        Assert.Equal(levi.Radical, g.Nilradical());
    }

    [Fact]
    public void Levi_factor_is_found_even_when_the_obvious_complement_is_not_a_subalgebra()
    {
        // Twist e(3) by the change of basis L_ij -> L_ij + P_1: the standard complement spanned by the new L's
        // no longer closes, so the correction step must do real work.
        var e3 = LieAlgebras.Euclidean<Rational>(3);
        var twisted = new[] { "L_12", "L_13", "L_23" }.Select(n => e3.Basis(n) + e3.Basis("P_1") + Samples.R(2) * e3.Basis("P_3"))
            .Concat(new[] { "P_1", "P_2", "P_3" }.Select(e3.Basis)).ToList();
        var g = e3.Subalgebra(twisted, ["A", "B", "C", "X", "Y", "Z"]);
        Assert.False(g.IsSubalgebra([g.Basis("A"), g.Basis("B"), g.Basis("C")]));
        var levi = g.LeviDecomposition();
        Assert.True(g.IsSubalgebra(levi.LeviFactor));
        Assert.Equal(3, levi.LeviFactor.Count);
        Assert.True(g.Subalgebra(levi.LeviFactor).IsCompactSemisimple());
    }

    [Fact]
    public void Radical_of_gl_n_is_its_center_and_Levi_factor_is_sl_n()
    {
        // Common practice: gl(n) = sl(n) + scalars.
        var gl = LieAlgebras.GeneralLinear<Rational>(3);
        var identity = gl.Basis("E_11") + gl.Basis("E_22") + gl.Basis("E_33");
        Assert.Equal(gl.Span([identity]), gl.SolvableRadical());
        Assert.Equal(gl.Span([identity]), gl.Center());
        Assert.Equal(gl.Span([identity]), gl.Nilradical());
        var levi = gl.LeviDecomposition();
        Assert.Equal(gl.DerivedAlgebra(), gl.Span(levi.LeviFactor));
    }

    [Fact]
    public void Nilradical_of_the_two_dimensional_nonabelian_algebra_is_the_derived_algebra()
    {
        // Common practice: for [x, y] = y the nilradical is span{y}, the radical everything.
        var b = LieAlgebra<Rational>.FromCommutatorTable("[x, y] = y");
        Assert.Equal(2, b.SolvableRadical().Count);
        Assert.Equal([b.Basis("y")], b.Nilradical());
        Assert.True(b.IsSolvable);
        Assert.True(b.IsSolvableByCartanCriterion);
        Assert.False(b.IsNilpotent);
    }

    [Fact]
    public void Centralizer_normalizer_and_generated_ideal_in_sl2()
    {
        var sl2 = Samples.Sl2();
        var h = sl2.Basis("H");
        var e = sl2.Basis("E");
        Assert.Equal([h], sl2.Centralizer([h]));

        // The normalizer of span{E} is the Borel subalgebra span{H, E} (Humphreys §15 terminology; common practice).
        Assert.Equal(sl2.Span([h, e]), sl2.Normalizer([e]));
        Assert.Equal(3, sl2.IdealGeneratedBy([e]).Count);
        Assert.Empty(sl2.Center());
    }

    [Fact]
    public void Cartan_criterion_for_solvability_agrees_with_the_derived_series_on_all_samples()
    {
        var samples = new[]
        {
            Samples.Sl2(), Samples.So3(), LieAlgebras.Heisenberg<Rational>(1), LieAlgebras.Euclidean<Rational>(2),
            LieAlgebras.Euclidean<Rational>(3), LieAlgebras.Galilei<Rational>(), LieAlgebras.GeneralLinear<Rational>(2),
        };
        foreach (var g in samples)
        {
            Assert.True(g.IsSolvable == g.IsSolvableByCartanCriterion, g.Label);
        }
    }

    [Fact]
    public void Radical_is_a_solvable_ideal_with_semisimple_quotient()
    {
        // Definition check of Rad(g) = [g,g]^⊥ (Bourbaki I §5.5 Prop. 5, from memory): the result must be a solvable
        // ideal, and g / Rad(g) semisimple, i.e. the Levi factor has non-degenerate Killing form.
        foreach (var g in new[] { LieAlgebras.Galilei<Rational>(), LieAlgebras.Euclidean<Rational>(4), LieAlgebras.Unitary(3) })
        {
            var radical = g.SolvableRadical();
            Assert.True(g.IsIdeal(radical), g.Label);
            Assert.True(g.Subalgebra(radical).IsSolvable, g.Label);
            var levi = g.LeviDecomposition().LeviFactor;
            Assert.True(g.Subalgebra(levi).IsSemisimple, g.Label);
            Assert.Equal(g.Dimension, radical.Count + levi.Count);
        }
    }

    [Fact]
    public void Levi_correction_works_through_two_levels_of_the_derived_series_of_the_radical()
    {
        // Galilei radical span{K, P, H} has derived series R ⊃ span{P} ⊃ 0. Twist the rotations by radical elements so
        // the naive complement fails at both levels; the computed factor must still be a complementary subalgebra ≅ so(3).
        var g = LieAlgebras.Galilei<Rational>();
        var twisted = new[] { "J_1", "J_2", "J_3" }
            .Select((n, a) => g.Basis(n) + g.Basis($"K_{(a + 1) % 3 + 1}") + Samples.R(a + 1) * g.Basis("H") + g.Basis($"P_{a + 1}"))
            .Concat(new[] { "K_1", "K_2", "K_3", "P_1", "P_2", "P_3", "H" }.Select(g.Basis)).ToList();
        var h = g.Subalgebra(twisted, ["A1", "A2", "A3", "B1", "B2", "B3", "C1", "C2", "C3", "T"]);
        Assert.False(h.IsSubalgebra([h.Basis("A1"), h.Basis("A2"), h.Basis("A3")]));
        var levi = h.LeviDecomposition();
        Assert.True(h.IsSubalgebra(levi.LeviFactor));
        Assert.Equal(h.Dimension, h.Span(levi.LeviFactor.Concat(levi.Radical)).Count);
        Assert.Equal(new FormSignature(0, 3, 0), h.Subalgebra(levi.LeviFactor).KillingSignature());
    }

    [Fact]
    public void Algebra_text_lists_the_non_zero_brackets()
    {
        Assert.Equal(
            "Lie algebra of dimension 3 from a bracket table, dimension 3, basis H, E, F\n[H, E] = 2 E\n[H, F] = -2 F\n[E, F] = H",
            Samples.Sl2().ToString());
    }

    [Fact]
    public void Derived_series_of_upper_triangular_3x3_matrices_has_dimensions_6_3_1_0()
    {
        // Common practice (Humphreys §3.1 example t(n), from memory): [t, t] = strictly upper n(3), [n, n] = span{E_13}.
        var units = new List<Exact.Matrices.Matrix<GaussianRational>>();
        var names = new List<string>();
        for (var i = 0; i < 3; i++)
        {
            for (var j = i; j < 3; j++)
            {
                var (r, c) = (i, j);
                units.Add(Exact.Matrices.Matrix<GaussianRational>.FromFunction(3, 3, (a, b) => a == r && b == c ? GaussianRational.One : GaussianRational.Zero));
                names.Add($"E_{i + 1}{j + 1}");
            }
        }

        var t = LieAlgebra<GaussianRational>.FromMatrices(units, names);
        Assert.Equal([6, 3, 1, 0], t.DerivedSeries().Select(s => s.Count));
        Assert.Equal([t.Basis("E_13")], t.DerivedSeries()[2]);
        Assert.True(t.IsSolvable);
        Assert.False(t.IsNilpotent);
        // Nilradical: strictly upper triangular matrices plus the central scalar matrices (ad I = 0), dimension 4.
        var identity = t.Basis("E_11") + t.Basis("E_22") + t.Basis("E_33");
        Assert.Equal(t.Span(new[] { "E_12", "E_13", "E_23" }.Select(t.Basis).Append(identity)), t.Nilradical());
    }
}
