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
/// any other symbol ranks below them, in the canonical symbol order (by name, <see cref="Symbol.Compare"/>), so the
/// default order never depends on which symbol was used first. Compare returns a positive number when the
/// first monomial is larger.
/// </summary>
public sealed class MonomialOrder : IComparer<Monomial>
{
    private readonly Dictionary<Symbol, int> _rank;

    // Rank key by Symbol.Id for the ranked case (-1 for unranked symbols); empty when there is no ranking (rank then
    // follows the canonical symbol order, which is also the storage order of factors).
    private readonly int[] _keyById;

    private IComparer<Monomial>? _descending;

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

        if (Ranking.Count == 0)
        {
            _keyById = [];
        }
        else
        {
            var maxId = Ranking.Max(r => r.Id);
            _keyById = new int[maxId + 1];
            Array.Fill(_keyById, -1);

            for (var k = 0; k < Ranking.Count; k++)
            {
                _keyById[Ranking[k].Id] = k;
            }
        }
    }

    /// <summary>Sorts monomials from largest to smallest under this order.</summary>
    internal IComparer<Monomial> Descending => _descending ??= Comparer<Monomial>.Create((a, b) => CompareCore(b, a));

    /// <summary>The default order used for display and canonical term order: graded reverse lexicographic, symbols ranked by name.</summary>
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

        return Symbol.Compare(b, a);
    }

    /// <inheritdoc />
    /// <remarks>Allocation-free; linear in the number of factors of the two monomials.</remarks>
    public int Compare(Monomial? x, Monomial? y)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        return CompareCore(x, y);
    }

    /// <summary>Compare without argument checks, for inner loops.</summary>
    internal int CompareCore(Monomial x, Monomial y)
    {
        if (ReferenceEquals(x, y))
        {
            return 0;
        }

        if (Kind != MonomialOrderKind.Lexicographic && x.TotalDegree != y.TotalDegree)
        {
            return x.TotalDegree < y.TotalDegree ? -1 : 1;
        }

        return _keyById.Length == 0 ? CompareByCanonicalRank(x, y) : CompareRanked(x, y);
    }

    // Without a ranking, rank follows the canonical symbol order, which is also the storage order of factors: walk from the front (lex)
    // or from the back (grevlex) and stop at the first difference.
    private int CompareByCanonicalRank(Monomial x, Monomial y)
    {
        var xs = x.SymbolArray;
        var ys = y.SymbolArray;
        var xe = x.ExponentArray;
        var ye = y.ExponentArray;
        if (Kind == MonomialOrderKind.GradedReverseLexicographic)
        {
            int i = xs.Length - 1, j = ys.Length - 1;
            while (i >= 0 && j >= 0)
            {
                if (ReferenceEquals(xs[i], ys[j]))
                {
                    if (xe[i] != ye[j])
                    {
                        return xe[i] < ye[j] ? 1 : -1;
                    }

                    i--;
                    j--;
                }
                else
                {
                    // The lower-ranked symbol occurs in only one of them; that one is smaller.
                    return Symbol.Compare(xs[i], ys[j]) > 0 ? -1 : 1;
                }
            }

            return i >= 0 ? -1 : j >= 0 ? 1 : 0;
        }

        {
            int i = 0, j = 0;
            while (i < xs.Length && j < ys.Length)
            {
                if (ReferenceEquals(xs[i], ys[j]))
                {
                    if (xe[i] != ye[j])
                    {
                        return xe[i] > ye[j] ? 1 : -1;
                    }

                    i++;
                    j++;
                }
                else
                {
                    // The higher-ranked symbol occurs in only one of them; that one is larger.
                    return Symbol.Compare(xs[i], ys[j]) < 0 ? 1 : -1;
                }
            }

            return i < xs.Length ? 1 : j < ys.Length ? -1 : 0;
        }
    }

    // With a ranking, merge the factor lists in canonical order and keep the differing symbol of extreme rank.
    private int CompareRanked(Monomial x, Monomial y)
    {
        var xs = x.SymbolArray;
        var ys = y.SymbolArray;
        var xe = x.ExponentArray;
        var ye = y.ExponentArray;
        var reverse = Kind == MonomialOrderKind.GradedReverseLexicographic;
        var bestKey = reverse ? int.MinValue : int.MaxValue;
        var bestDifference = 0;
        var position = 0;
        int i = 0, j = 0;
        while (i < xs.Length || j < ys.Length)
        {
            Symbol symbol;
            int difference;
            if (j == ys.Length || (i < xs.Length && Symbol.Compare(xs[i], ys[j]) < 0))
            {
                symbol = xs[i];
                difference = xe[i++];
            }
            else if (i == xs.Length || Symbol.Compare(ys[j], xs[i]) < 0)
            {
                symbol = ys[j];
                difference = -ye[j++];
            }
            else
            {
                symbol = xs[i];
                difference = xe[i++] - ye[j++];
            }

            position++;
            if (difference == 0)
            {
                continue;
            }

            var key = KeyOf(symbol, position);
            if (reverse ? key > bestKey : key < bestKey)
            {
                bestKey = key;
                bestDifference = difference;
            }
        }

        if (bestDifference == 0)
        {
            return 0;
        }

        return reverse ? (bestDifference < 0 ? 1 : -1) : (bestDifference > 0 ? 1 : -1);
    }

    // Smaller key = higher rank. Ranked symbols get their position in the ranking; the others follow in canonical
    // order, which is the order of the merge, so the merge position is a valid key among them.
    private int KeyOf(Symbol symbol, int mergePosition)
    {
        var id = symbol.Id;
        var key = id < _keyById.Length ? _keyById[id] : -1;
        return key >= 0 ? key : Ranking.Count + mergePosition;
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
        return Ranking.Count == 0 ? $"{kind} (symbols ranked by name)" : $"{kind} with {string.Join(" > ", Ranking)}";
    }
}
