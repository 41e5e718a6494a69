using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class BasisChangeTests
{
    // sl(2) in the basis H, X = E + F, Y = E - F: [H, X] = 2 Y, [H, Y] = 2 X, [X, Y] = -2 H (common practice; the split
    // real form written with a compact generator Y).
    [Fact]
    public void Sl2_in_the_basis_H_E_plus_F_E_minus_F_has_the_textbook_brackets()
    {
        var sl2 = Samples.Sl2();
        var h = sl2.Basis("H");
        var e = sl2.Basis("E");
        var f = sl2.Basis("F");
        var g = sl2.InBasis([h, e + f, e - f], ["H", "X", "Y"]);
        Assert.Equal(2 * g.Basis("Y"), g.Bracket(g.Basis("H"), g.Basis("X")));
        Assert.Equal(2 * g.Basis("X"), g.Bracket(g.Basis("H"), g.Basis("Y")));
        Assert.Equal(-2 * g.Basis("H"), g.Bracket(g.Basis("X"), g.Basis("Y")));
    }

    // Structure constants transform as a tensor: c' = B^{-1} c(B, B) (common practice); checked against the brackets of
    // the old algebra on random rational bases of sl(3).
    [Fact]
    public void Brackets_in_a_random_basis_agree_with_the_original_algebra()
    {
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var random = new Random(31);
        for (var trial = 0; trial < KillingFormTests.Iterations; trial++)
        {
            var basis = Enumerable.Range(0, g.Dimension)
                .Select(_ => g.Element(Enumerable.Range(0, g.Dimension).Select(_ => new Rational(random.Next(-3, 4), random.Next(1, 3))).ToArray()))
                .ToList();
            var h = g.InBasis(basis);
            for (var i = 0; i < g.Dimension; i++)
            {
                for (var j = 0; j < g.Dimension; j++)
                {
                    var expected = g.Bracket(basis[i], basis[j]);
                    var actual = g.Zero;
                    for (var k = 0; k < g.Dimension; k++)
                    {
                        actual += h.StructureConstant(i, j, k) * basis[k];
                    }

                    Assert.True(expected == actual, $"trial {trial}, pair ({i}, {j})");
                }
            }
        }
    }

    [Fact]
    public void Dependent_elements_are_refused_with_the_first_dependent_one_named()
    {
        var sl2 = Samples.Sl2();
        var h = sl2.Basis("H");
        var e = sl2.Basis("E");
        var error = Assert.Throws<ExactArgumentException>(() => sl2.InBasis([h, e, h + e]));
        Assert.Contains("linearly dependent", error.Message);
        Assert.Contains("element 3", error.Message);
    }

    [Fact]
    public void Wrong_counts_and_foreign_elements_are_refused()
    {
        var sl2 = Samples.Sl2();
        var so3 = Samples.So3();
        Assert.Contains("needs 3 elements", Assert.Throws<ExactArgumentException>(() => sl2.InBasis([sl2.Basis("H")])).Message);
        Assert.Contains("2 names", Assert.Throws<ExactArgumentException>(
            () => sl2.InBasis([sl2.Basis(0), sl2.Basis(1), sl2.Basis(2)], ["a", "b"])).Message);
        Assert.Throws<ExactArgumentException>(() => sl2.InBasis([sl2.Basis(0), sl2.Basis(1), so3.Basis(2)]));
    }
}
