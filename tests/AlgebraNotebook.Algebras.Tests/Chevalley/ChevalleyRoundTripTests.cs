using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Tests.Chevalley;

public class ChevalleyRoundTripTests
{
    // The algebra layer's root decomposition and summary identify the constructed algebra as the type it was built from
    // (identification by the Cartan matrix: Humphreys 11.4 and de Graaf, Lie Algebras: Theory and Algorithms, ch. 5).
    [Theory]
    [InlineData("A1")]
    [InlineData("A2")]
    [InlineData("A3")]
    [InlineData("A4")]
    [InlineData("B2")]
    [InlineData("B3")]
    [InlineData("C3")]
    [InlineData("D4")]
    [InlineData("G2")]
    [InlineData("F4")]
    [InlineData("E6")]
    [InlineData("B2+A1")]
    public void Root_decomposition_identifies_the_type(string type)
    {
        var basis = ChevalleyBasis.Of(type);
        var algebra = basis.ToLieAlgebra();
        var decomposition = algebra.RootDecomposition();
        Assert.NotNull(decomposition.Type);
        Assert.True(decomposition.Type!.IsIsomorphicTo(CartanType.Parse(type)), $"{type} identified as {decomposition.Type}");
    }

    [Theory]
    [InlineData("A3")]
    [InlineData("C3")]
    [InlineData("G2")]
    public void Summary_reports_a_simple_algebra_of_the_type(string type)
    {
        var summary = ChevalleyBasis.Of(type).ToLieAlgebra().Summary();
        Assert.True(summary.IsSemisimple);
        Assert.NotNull(summary.LeviFactorType);
        Assert.True(summary.LeviFactorType!.IsIsomorphicTo(CartanType.Parse(type)));
    }

    // Killing form on the Cartan subalgebra: K(h_i, h_j) = 2 h^vee (alpha_i^vee, alpha_j^vee) with long roots of squared
    // length 2 (the Killing form is 2 h^vee times the normalised invariant form; Kac, Infinite-dimensional Lie algebras,
    // Exercise 6.2, from memory), and K(e_alpha, f_alpha) = 2 h^vee * 2/(alpha, alpha). Dual Coxeter numbers: E6 12,
    // F4 9, G2 4 (Bourbaki plates, comarks).
    [Theory]
    [InlineData("G2", 4)]
    [InlineData("F4", 9)]
    [InlineData("E6", 12)]
    public void Killing_form_is_twice_the_dual_Coxeter_number_times_the_normalised_form(string type, int dualCoxeter)
    {
        var basis = ChevalleyBasis.Of(type);
        var system = basis.System;
        Assert.Equal(dualCoxeter, system.DualCoxeterNumber);
        var killing = basis.ToLieAlgebra().KillingForm();
        var lengths = system.SimpleRootLengthsSquared;
        var r = system.Rank;
        for (var i = 0; i < r; i++)
        {
            for (var j = 0; j < r; j++)
            {
                var coroots = 4 * system.SymmetrisedForm[i, j] / (lengths[i] * lengths[j]);
                Assert.Equal(2 * dualCoxeter * coroots, killing[i, j]);
            }
        }

        var count = system.NumberOfPositiveRoots;
        for (var a = 0; a < count; a++)
        {
            var expected = 2 * dualCoxeter * (2 / system.PositiveRoots[a].LengthSquared);
            Assert.Equal(expected, killing[r + a, r + count + a]);
        }
    }
}
