using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Series;

/// <summary>Small helpers shared by the series tests.</summary>
internal static class SeriesTestHelpers
{
    /// <summary>The coefficient of symbol^power.</summary>
    public static T CoefficientOf<T>(this TruncatedSeries<T> series, Symbol symbol, int power)
        where T : IRationalAlgebraElement<T> =>
        series.Coefficient(Monomial.Of(symbol, power));

    /// <summary>n! as a rational.</summary>
    public static Rational Factorial(int n)
    {
        var result = System.Numerics.BigInteger.One;
        for (var k = 2; k <= n; k++)
        {
            result *= k;
        }

        return result;
    }

    /// <summary>The series sum_k coefficients[k] x^k + O(x^order).</summary>
    public static TruncatedSeries<Rational> Univariate(Symbol x, int order, Func<int, Rational> coefficient) =>
        TruncatedSeries<Rational>.FromTerms(Enumerable.Range(0, order).Select(k => (Monomial.Of(x, k), coefficient(k))), order, [x]);
}
