using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>The kind of a monomial order.</summary>
public enum MonomialOrderKind
{
    /// <summary>Lexicographic: compare exponents of the highest-ranked symbol first.</summary>
    Lexicographic,

    /// <summary>Total degree first, ties broken lexicographically.</summary>
    GradedLexicographic,

    /// <summary>Total degree first, ties broken by the smaller exponent of the lowest-ranked symbol winning (grevlex).</summary>
    GradedReverseLexicographic,
}

/// <summary>
/// A monomial order: a kind plus a ranking of symbols. Symbols listed in the ranking come first, in the given order;
/// any other symbol ranks below them, by <see cref="Symbol.Id"/> (first use). Compare returns a positive number when the
/// first monomial is larger.
/// </summary>
public sealed class MonomialOrder : IComparer<Monomial>
{
    private readonly Dictionary<Symbol, int> _rank;

    /// <summary>Creates an order of the given kind with an explicit ranking (highest first).</summary>
    public MonomialOrder(MonomialOrderKind kind, IEnumerable<Symbol>? ranking = null)
    {
        Kind = kind;
        Ranking = (ranking ?? []).Distinct().ToArray();
        _rank = new Dictionary<Symbol, int>();
        for (var k = 0; k < Ranking.Count; k++)
        {
            _rank[Ranking[k]] = k;
        }
    }

    /// <summary>The default order used for display and canonical term order: graded reverse lexicographic by first use.</summary>
    public static MonomialOrder Default { get; } = new(MonomialOrderKind.GradedReverseLexicographic);

    /// <summary>The kind of order.</summary>
    public MonomialOrderKind Kind { get; }

    /// <summary>Explicitly ranked symbols, highest first.</summary>
    public IReadOnlyList<Symbol> Ranking { get; }

    /// <summary>Compares two symbols by rank: positive when <paramref name="a"/> ranks higher.</summary>
    public int CompareSymbols(Symbol a, Symbol b)
    {
        if (ReferenceEquals(a, b))
        {
            return 0;
        }

        var ra = _rank.TryGetValue(a, out var x) ? x : int.MaxValue;
        var rb = _rank.TryGetValue(b, out var y) ? y : int.MaxValue;
        if (ra != rb)
        {
            return rb.CompareTo(ra);
        }

        return b.Id.CompareTo(a.Id);
    }

    /// <inheritdoc />
    public int Compare(Monomial? x, Monomial? y)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        if (ReferenceEquals(x, y))
        {
            return 0;
        }

        if (Kind != MonomialOrderKind.Lexicographic && x.TotalDegree != y.TotalDegree)
        {
            return x.TotalDegree.CompareTo(y.TotalDegree);
        }

        // Walk the symbols of both monomials from highest rank (lex) or lowest rank (grevlex).
        var symbols = x.Factors.Select(f => f.Symbol).Union(y.Factors.Select(f => f.Symbol)).ToList();
        symbols.Sort((a, b) => CompareSymbols(b, a)); // highest rank first
        if (Kind == MonomialOrderKind.GradedReverseLexicographic)
        {
            for (var k = symbols.Count - 1; k >= 0; k--)
            {
                var d = x.ExponentOf(symbols[k]) - y.ExponentOf(symbols[k]);
                if (d != 0)
                {
                    return d < 0 ? 1 : -1;
                }
            }

            return 0;
        }

        foreach (var symbol in symbols)
        {
            var d = x.ExponentOf(symbol) - y.ExponentOf(symbol);
            if (d != 0)
            {
                return d;
            }
        }

        return 0;
    }

    /// <inheritdoc />
    public override string ToString()
    {
        var kind = Kind switch
        {
            MonomialOrderKind.Lexicographic => "lexicographic",
            MonomialOrderKind.GradedLexicographic => "graded lexicographic",
            _ => "graded reverse lexicographic",
        };
        return Ranking.Count == 0 ? $"{kind} (symbols ranked by first use)" : $"{kind} with {string.Join(" > ", Ranking)}";
    }
}
