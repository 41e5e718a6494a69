using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;

namespace AlgebraNotebook.Display.Conversion;

/// <summary>Display trees for truncated power series, written once for every coefficient type.</summary>
internal static class SeriesConverters
{
    /// <summary>
    /// The known terms grouped by total degree (ascending; within a degree in the order of
    /// <see cref="TruncatedSeries{T}.Terms"/>), then the order term when the series is truncated: O(t^N) for one
    /// parameter, O((s, t)^N) for several (the N-th power of the ideal they generate), O(t) and O(s, t) for N = 1,
    /// O(1) for N = 0 or no parameters. The exact zero is 0.
    /// </summary>
    public static MathNode FromTruncatedSeries<T>(TruncatedSeries<T> series)
        where T : IRationalAlgebraElement<T>
    {
        var terms = series.Terms
            .OrderBy(term => term.Monomial.TotalDegree)
            .Select(term => new SumTerm(false, PolynomialConverters.Term(term.Monomial, term.Coefficient)))
            .ToList();
        if (series.Order != int.MaxValue)
        {
            terms.Add(new SumTerm(false, new BigONode(OrderArgument(series.Parameters.Select(p => p.Name).ToArray(), series.Order))));
        }

        return MathNodes.Sum(terms);
    }

    private static MathNode OrderArgument(string[] parameters, int order)
    {
        if (order == 0 || parameters.Length == 0)
        {
            return MathNodes.One;
        }

        if (parameters.Length == 1)
        {
            return MathNodes.Power(MathNodes.Symbol(parameters[0]), order);
        }

        var list = new List<MathNode>();
        foreach (var name in parameters)
        {
            if (list.Count > 0)
            {
                list.Add(MathNodes.Operator(","));
            }

            list.Add(MathNodes.Symbol(name));
        }

        var ideal = new RowNode(list);
        return order == 1 ? ideal : new PowerNode(MathNodes.Fenced(ideal), MathNodes.Integer(order));
    }
}
