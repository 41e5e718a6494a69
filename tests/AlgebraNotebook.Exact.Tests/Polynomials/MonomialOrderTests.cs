using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Symbols;
using static AlgebraNotebook.Exact.Tests.Polynomials.PolynomialTestData;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

public class MonomialOrderTests
{
    [Fact]
    public void Fast_comparison_agrees_with_the_exponent_vector_definition()
    {
        // Definitions of lex, grlex and grevlex on exponent vectors: Cox, Little & O'Shea (4th ed.), Section 2.2, Definitions 3, 5, 6.
        var random = new Random(51);
        var symbols = new[] { S("oa"), S("ob"), S("oc"), S("od") };
        var rankings = new Symbol[][] { [], [symbols[2], symbols[0]], [symbols[3], symbols[2], symbols[1], symbols[0]] };
        foreach (var kind in Enum.GetValues<MonomialOrderKind>())
        {
            foreach (var ranking in rankings)
            {
                var order = new MonomialOrder(kind, ranking);
                var ranked = symbols.OrderBy(s => s, Comparer<Symbol>.Create((a, b) => order.CompareSymbols(b, a))).ToArray();
                for (var k = 0; k < Iterations(300); k++)
                {
                    var x = RandomMonomial(random, symbols, 3);
                    var y = random.Next(5) == 0 ? x : RandomMonomial(random, symbols, 3);
                    var expected = Reference(kind, ranked, x, y);
                    Assert.True(Math.Sign(order.Compare(x, y)) == expected, $"{order}: compare({x}, {y}) should be {expected}");
                }
            }
        }
    }

    [Fact]
    public void Orders_rank_the_textbook_exponent_vectors()
    {
        // Cox, Little & O'Shea (4th ed.), Section 2.2 (from memory): (1,2,0) >lex (0,3,4); (1,2,3) >grlex (3,2,0);
        // (4,7,1) >grevlex (4,2,3); (1,5,2) >grevlex (4,1,3).
        var (x, y, z) = (S("x"), S("y"), S("z"));
        var lex = new MonomialOrder(MonomialOrderKind.Lexicographic, [x, y, z]);
        var grlex = new MonomialOrder(MonomialOrderKind.GradedLexicographic, [x, y, z]);
        var grevlex = new MonomialOrder(MonomialOrderKind.GradedReverseLexicographic, [x, y, z]);
        Assert.True(lex.Compare(M("x y^2"), M("y^3 z^4")) > 0);
        Assert.True(grlex.Compare(M("x y^2 z^3"), M("x^3 y^2")) > 0);
        Assert.True(grevlex.Compare(M("x^4 y^7 z"), M("x^4 y^2 z^3")) > 0);
        Assert.True(grevlex.Compare(M("x y^5 z^2"), M("x^4 y z^3")) > 0);
    }

    private static Monomial M(string text) => Q(text).LeadingMonomial();

    private static int Reference(MonomialOrderKind kind, Symbol[] ranked, Monomial x, Monomial y)
    {
        var ex = ranked.Select(x.ExponentOf).ToArray();
        var ey = ranked.Select(y.ExponentOf).ToArray();
        if (kind != MonomialOrderKind.Lexicographic && ex.Sum() != ey.Sum())
        {
            return Math.Sign(ex.Sum() - ey.Sum());
        }

        if (kind == MonomialOrderKind.GradedReverseLexicographic)
        {
            for (var k = ranked.Length - 1; k >= 0; k--)
            {
                if (ex[k] != ey[k])
                {
                    return ex[k] < ey[k] ? 1 : -1;
                }
            }

            return 0;
        }

        for (var k = 0; k < ranked.Length; k++)
        {
            if (ex[k] != ey[k])
            {
                return Math.Sign(ex[k] - ey[k]);
            }
        }

        return 0;
    }
}
