using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Series;

/// <summary>Projection of a dense truncated associative series (known to be a Lie series) onto the Lyndon basis.</summary>
internal static class SeriesProjection
{
    public static LieSeries ToLieSeries(FreeLieAlgebra algebra, DenseWordSeries series, int order)
    {
        var k = algebra.Alphabet.Count;
        var terms = new List<(LyndonWord Word, Rational Coefficient)>();
        var expansions = new DenseExpansions(k);
        var last = Math.Min(series.MaxDegree, order - 1);
        for (var d = 1; d <= last; d++)
        {
            if (!LieExpansion.TryProjectDense(k, d, series.Parts[d], terms, expansions))
            {
                throw new InvalidOperationException($"Internal error: the degree-{d} part of the series is not a Lie element.");
            }
        }

        return new LieSeries(algebra, terms, order);
    }
}
