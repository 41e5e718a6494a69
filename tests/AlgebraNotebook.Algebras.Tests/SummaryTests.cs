using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Tests;

public class SummaryTests
{
    [Fact]
    public void Galilei_summary_reports_radical_nilradical_and_a_Levi_factor_of_type_A1()
    {
        // Common practice: Galilei = so(3) ⋉ (nilpotent radical of dimension 7); so(3) ⊗ C = sl(2, C) (A1).
        var summary = LieAlgebras.Galilei<Rational>().Summary();
        Assert.Equal(10, summary.Dimension);
        Assert.False(summary.IsSolvable);
        Assert.False(summary.IsSemisimple);
        Assert.Equal(7, summary.RadicalDimension);
        Assert.Equal(7, summary.NilradicalDimension);
        Assert.Equal(0, summary.CenterDimension);
        Assert.Equal(3, summary.LeviFactorDimension);
        Assert.Equal(CartanType.Parse("A1"), summary.LeviFactorType);
        // [g, g] misses H: no documented bracket has H on its right-hand side.
        Assert.Equal(9, summary.DerivedDimension);
        Assert.Equal(
            "dimension 10, neither solvable nor semisimple; centre 0, [g,g] 9, radical 7 (nilradical 7); Levi factor of dimension 3, type A1",
            summary.ToString());
    }

    [Fact]
    public void Summary_of_the_Lorentz_algebra_is_simple_over_R_with_complex_type_A1_plus_A1()
    {
        var summary = LieAlgebras.Orthogonal<Rational>(3, 1).Summary();
        Assert.True(summary.IsSemisimple);
        Assert.Equal([6], summary.SimpleIdealDimensions);
        Assert.True(CartanType.Parse("A1+A1").IsIsomorphicTo(summary.LeviFactorType!));
    }

    [Fact]
    public void Summary_of_gl3_over_Q_i_and_of_the_Heisenberg_algebra()
    {
        var gl = LieAlgebras.GeneralLinear<GaussianRational>(3).Summary();
        Assert.Equal(1, gl.CenterDimension);
        Assert.Equal(CartanType.Parse("A2"), gl.LeviFactorType);

        var h = LieAlgebras.Heisenberg<Rational>(1).Summary();
        Assert.True(h.IsNilpotent);
        Assert.Null(h.LeviFactorType);
        Assert.StartsWith("dimension 3, nilpotent", h.ToString());
    }
}
