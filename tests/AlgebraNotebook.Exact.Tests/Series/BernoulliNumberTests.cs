using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Bernoulli numbers from the reciprocal of the series (e^x - 1)/x.</summary>
public class BernoulliNumberTests
{
    // OEIS A027641 (numerators of B_n, convention B_1 = -1/2), n = 0..30.
    private static readonly long[] Numerators =
    [
        1, -1, 1, 0, -1, 0, 1, 0, -1, 0, 5, 0, -691, 0, 7, 0, -3617, 0, 43867, 0, -174611, 0, 854513, 0, -236364091, 0,
        8553103, 0, -23749461029, 0, 8615841276005,
    ];

    // OEIS A027642 (denominators of B_n), n = 0..30.
    private static readonly long[] Denominators =
    [
        1, 2, 6, 1, 30, 1, 42, 1, 30, 1, 66, 1, 2730, 1, 6, 1, 510, 1, 798, 1, 330, 1, 138, 1, 2730, 1, 6, 1, 870, 1, 14322,
    ];

    [Fact]
    public void Bernoulli_numbers_B0_to_B30_match_OEIS_A027641_and_A027642()
    {
        var x = Symbol.Of("x");
        // (e^x - 1)/x = sum_k x^k/(k+1)!, built from Exp by shifting the coefficients down one degree.
        var exp = TruncatedSeries<Rational>.Parameter(x, 32).Exp();
        var shifted = TruncatedSeries<Rational>.FromTerms(
            exp.Terms.Where(t => t.Monomial.TotalDegree >= 1).Select(t => (Monomial.Of(x, t.Monomial.TotalDegree - 1), t.Coefficient)), 31, [x]);

        // x/(e^x - 1) = sum_n B_n x^n/n! (generating function of the Bernoulli numbers, OEIS A027641).
        var generating = shifted.Reciprocal();

        Assert.Equal(31, generating.Order);
        for (var n = 0; n <= 30; n++)
        {
            var bernoulli = generating.CoefficientOf(x, n) * SeriesTestHelpers.Factorial(n);
            Assert.True(bernoulli == new Rational(Numerators[n], Denominators[n]),
                $"B_{n} = {bernoulli}, OEIS A027641/A027642 give {Numerators[n]}/{Denominators[n]}");
        }
    }

    [Fact]
    public void Dividing_by_the_series_gives_the_same_numbers_as_the_reciprocal()
    {
        var x = Symbol.Of("x");
        var exp = TruncatedSeries<Rational>.Parameter(x, 12).Exp();
        var shifted = TruncatedSeries<Rational>.FromTerms(
            exp.Terms.Where(t => t.Monomial.TotalDegree >= 1).Select(t => (Monomial.Of(x, t.Monomial.TotalDegree - 1), t.Coefficient)), 11, [x]);
        Assert.Equal(shifted.Reciprocal(), TruncatedSeries<Rational>.One.Divide(shifted));
        // f * (1/f) = 1 up to the order (definition of the reciprocal).
        Assert.Equal("1 + O(x^11)", (shifted * shifted.Reciprocal()).ToString());
    }
}
