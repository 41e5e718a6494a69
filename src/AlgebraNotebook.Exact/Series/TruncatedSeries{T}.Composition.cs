using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Series;

public sealed partial class TruncatedSeries<T>
{
    /// <summary>
    /// Substitutes the series <paramref name="replacement"/> for the parameter <paramref name="parameter"/>
    /// (composition). See <see cref="Compose(IReadOnlyDictionary{Symbol, TruncatedSeries{T}})"/> for the order of the result.
    /// </summary>
    /// <exception cref="ExactArgumentException">
    /// This series is not exact and the replacement's constant term is not known to be zero.
    /// </exception>
    public TruncatedSeries<T> Substitute(Symbol parameter, TruncatedSeries<T> replacement)
    {
        ArgumentNullException.ThrowIfNull(parameter);
        ArgumentNullException.ThrowIfNull(replacement);
        return Compose(new Dictionary<Symbol, TruncatedSeries<T>> { [parameter] = replacement });
    }

    /// <summary>
    /// f(g) for a series f in at most one parameter: substitutes <paramref name="inner"/> for that parameter.
    /// A constant f is returned unchanged.
    /// </summary>
    /// <exception cref="ExactArgumentException">f has more than one parameter, or the substitution is not defined (see <see cref="Substitute"/>).</exception>
    public TruncatedSeries<T> Compose(TruncatedSeries<T> inner)
    {
        ArgumentNullException.ThrowIfNull(inner);
        if (_parameters.Length > 1)
        {
            throw new ExactArgumentException(
                $"Compose(inner) needs a series in one parameter, but {this} has the parameters {string.Join(", ", _parameters.Select(p => p.Name))}; use Substitute or Compose with a dictionary.",
                nameof(inner));
        }

        return _parameters.Length == 0 ? this : Substitute(_parameters[0], inner);
    }

    /// <summary>
    /// Simultaneous substitution of series for parameters. Parameters not mentioned stay as they are.
    /// </summary>
    /// <remarks>
    /// Order of the result: the unknown tail O(N) of f (total degree &gt;= N in its parameters) becomes terms of degree
    /// at least N * v, where v is the smallest valuation (lowest known degree) among the replacements and the parameters
    /// left alone (valuation 1); each replacement that occurs in a known term of f also contributes its own order
    /// (big-O arithmetic). The result's order is the minimum of these. The parameters of the result are the parameters of
    /// f that are not replaced together with those of the replacements. An exact f (a polynomial) may take
    /// replacements with any constant term.
    /// Cost: the powers of each replacement up to the largest exponent in f, then one scalar-times-series per term.
    /// </remarks>
    /// <exception cref="ExactArgumentException">
    /// f is not exact and a replacement's constant term is non-zero or unknown (the result would need infinitely many
    /// terms of f).
    /// </exception>
    public TruncatedSeries<T> Compose(IReadOnlyDictionary<Symbol, TruncatedSeries<T>> replacements)
    {
        ArgumentNullException.ThrowIfNull(replacements);
        var active = new Dictionary<Symbol, TruncatedSeries<T>>();
        foreach (var (symbol, replacement) in replacements)
        {
            if (symbol is null || replacement is null)
            {
                throw new ExactArgumentException("A substitution has a null parameter or replacement.", nameof(replacements));
            }

            if (_parameters.Contains(symbol))
            {
                active[symbol] = replacement;
            }
        }

        if (active.Count == 0)
        {
            return this;
        }

        if (!IsExact)
        {
            foreach (var (symbol, replacement) in active)
            {
                if (replacement.Order == 0 || !replacement.ConstantTermCore.IsZero)
                {
                    var constant = replacement.Order == 0 ? "unknown" : replacement.ConstantTermCore.ToString();
                    throw new ExactArgumentException(
                        $"Cannot substitute {replacement} for {symbol} in {this}: the replacement's constant term must be 0 (it is {constant}), " +
                        "otherwise every unknown term of the series would contribute to every coefficient.", nameof(replacements));
                }
            }
        }

        // Order of the substituted unknown tail.
        long tailOrder = ExactOrder;
        if (!IsExact)
        {
            long smallestValuation = long.MaxValue;
            foreach (var p in _parameters)
            {
                smallestValuation = Math.Min(smallestValuation, active.TryGetValue(p, out var g) ? g.Valuation : 1);
            }

            tailOrder = Order == 0 ? 0 : smallestValuation >= ExactOrder ? ExactOrder : Math.Min((long)Order * smallestValuation, ExactOrder);
        }

        var order = (int)tailOrder;
        foreach (var (symbol, replacement) in active)
        {
            if (_terms.Any(t => t.Monomial.ExponentOf(symbol) > 0))
            {
                order = Math.Min(order, replacement.Order);
            }
        }

        var parameters = new HashSet<Symbol>(_parameters.Where(p => !active.ContainsKey(p)));
        foreach (var replacement in active.Values)
        {
            parameters.UnionWith(replacement._parameters);
        }

        var truncated = active.ToDictionary(a => a.Key, a => a.Value.Truncate(order));
        var powers = truncated.ToDictionary(a => a.Key, a => new List<TruncatedSeries<T>> { OneValue, a.Value });
        var sums = new Dictionary<Monomial, T>();
        foreach (var (monomial, coefficient) in _terms)
        {
            var kept = new List<(Symbol, int)>();
            var product = OneValue;
            foreach (var (symbol, exponent) in monomial.Factors)
            {
                if (powers.TryGetValue(symbol, out var list))
                {
                    while (list.Count <= exponent)
                    {
                        list.Add(list[^1] * list[1]);
                    }

                    product *= list[exponent];
                }
                else
                {
                    kept.Add((symbol, exponent));
                }
            }

            var keptMonomial = Monomial.FromFactors(kept);
            foreach (var (m, c) in product._terms)
            {
                var full = keptMonomial * m;
                if (full.TotalDegree < order)
                {
                    var value = coefficient * c;
                    sums[full] = sums.TryGetValue(full, out var old) ? old + value : value;
                }
            }
        }

        return FromSums(sums, order, parameters);
    }

    /// <summary>The lowest total degree of a known term; the order when no term is known; <see cref="ExactOrder"/> for the exact zero.</summary>
    internal int Valuation => _terms.Length > 0 ? _terms[0].Monomial.TotalDegree : Order;
}
