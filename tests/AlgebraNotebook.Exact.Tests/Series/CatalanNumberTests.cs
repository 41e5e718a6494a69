using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Catalan numbers from the functional equation C = 1 + x C^2 and from the closed form with a square root.</summary>
public class CatalanNumberTests
{
    // OEIS A000108 (Catalan numbers), n = 0..20.
    private static readonly long[] Catalan =
    [
        1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862, 16796, 58786, 208012, 742900, 2674440, 9694845, 35357670, 129644790,
        477638700, 1767263190, 6564120420,
    ];

    [Fact]
    public void Fixed_point_of_C_equals_one_plus_x_C_squared_gives_OEIS_A000108()
    {
        var xs = Symbol.Of("x");
        var x = TruncatedSeries<Rational>.Parameter(xs, 21);
        var c = TruncatedSeries<Rational>.One;
        // Each iteration fixes one more coefficient; 21 iterations fix degrees 0..20.
        for (var iteration = 0; iteration < 21; iteration++)
        {
            c = TruncatedSeries<Rational>.One + x * c * c;
        }

        Assert.Equal(c, TruncatedSeries<Rational>.One + x * c * c);
        for (var n = 0; n <= 20; n++)
        {
            Assert.True(c.CoefficientOf(xs, n) == Catalan[n], $"[x^{n}] C = {c.CoefficientOf(xs, n)}, OEIS A000108 gives {Catalan[n]}");
        }
    }

    [Fact]
    public void Square_root_of_one_minus_four_x_gives_the_same_numbers()
    {
        // C(x) = (1 - sqrt(1 - 4x))/(2x), so sqrt(1 - 4x) = 1 - 2 sum_{n>=0} C_n x^(n+1) (OEIS A000108, formula section).
        var xs = Symbol.Of("x");
        var x = TruncatedSeries<Rational>.Parameter(xs, 22);
        var root = (TruncatedSeries<Rational>.One - x.Scale(4)).Pow(new Rational(1, 2));
        Assert.Equal(TruncatedSeries<Rational>.One - x.Scale(4), root * root);
        for (var n = 0; n <= 20; n++)
        {
            Assert.Equal(new Rational(-2 * Catalan[n]), root.CoefficientOf(xs, n + 1));
        }
    }
}
