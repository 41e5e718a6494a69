using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>
/// An element (or a truncated series) of a <see cref="FreeLieAlgebra"/>: a combination of Lyndon basis elements P(w)
/// with exact rational coefficients, grouped by degree. <see cref="Order"/> is the truncation order: terms of degree
/// at least Order are unknown (int.MaxValue for an exact element). Sealed and immutable.
/// </summary>
/// <remarks>
/// Terms are ordered by degree, then by Lyndon word (lexicographically). Text: "X + Y + 1/2 [X, Y] + 1/12 [X, [X, Y]]
/// + 1/12 [[X, Y], Y] + O(degree 4)", each basis element written as its standard bracketing.
/// </remarks>
public sealed class LieSeries : IEquatable<LieSeries>
{
    private readonly (LyndonWord Word, Rational Coefficient)[] _terms;
    private Dictionary<Word, Rational>? _lookup;

    internal LieSeries(FreeLieAlgebra algebra, IEnumerable<(LyndonWord Word, Rational Coefficient)> terms, int order)
    {
        Algebra = algebra;
        Order = order;
        var merged = new Dictionary<Word, Rational>();
        foreach (var (w, c) in terms)
        {
            if (w.Degree < order)
            {
                AssociativeElement.AddTo(merged, w.Word, c);
            }
        }

        _terms = merged
            .Select(p => (LyndonWord.FromTrusted(p.Key), p.Value))
            .OrderBy(t => t.Item1.Degree)
            .ThenBy(t => t.Item1.Word)
            .ToArray();
    }

    // Terms already merged, non-zero, below the order and sorted by degree then word (trusted callers only).
    private LieSeries(FreeLieAlgebra algebra, (LyndonWord Word, Rational Coefficient)[] sortedTerms, int order, bool trusted)
    {
        _ = trusted;
        Algebra = algebra;
        Order = order;
        _terms = sortedTerms;
    }

    internal static LieSeries FromSortedTerms(FreeLieAlgebra algebra, (LyndonWord Word, Rational Coefficient)[] sortedTerms, int order) =>
        new(algebra, sortedTerms, order, trusted: true);

    /// <summary>The free Lie algebra this element lives in.</summary>
    public FreeLieAlgebra Algebra { get; }

    /// <summary>Truncation order: the terms of degree at least Order are unknown; int.MaxValue when exact.</summary>
    public int Order { get; }

    /// <summary>True when no truncation applies.</summary>
    public bool IsExact => Order == int.MaxValue;

    /// <summary>The non-zero terms, by degree then Lyndon word.</summary>
    public IReadOnlyList<(LyndonWord Word, Rational Coefficient)> Terms => _terms;

    /// <summary>True when all known terms vanish.</summary>
    public bool IsZero => _terms.Length == 0;

    /// <summary>The smallest degree with a non-zero term; -1 for zero.</summary>
    public int MinDegree => _terms.Length == 0 ? -1 : _terms[0].Word.Degree;

    /// <summary>The largest degree with a non-zero term; -1 for zero.</summary>
    public int MaxDegree => _terms.Length == 0 ? -1 : _terms[^1].Word.Degree;

    /// <summary>The coordinate on the basis element P(w).</summary>
    /// <exception cref="ExactArgumentException">The degree of w is not below the truncation order (the coordinate is unknown).</exception>
    public Rational CoefficientOf(LyndonWord word)
    {
        if (word.Degree >= Order)
        {
            throw new ExactArgumentException($"The coefficient of {Algebra.FormatBasisElement(word)} (degree {word.Degree}) is unknown: the series is truncated at order {Order}.", nameof(word));
        }

        _lookup ??= _terms.ToDictionary(t => t.Word.Word, t => t.Coefficient);
        return _lookup.TryGetValue(word.Word, out var c) ? c : Rational.Zero;
    }

    /// <summary>The coordinate on P(w) for a Lyndon word spelled by generator names, e.g. CoefficientOf("X", "Y", "Y").</summary>
    /// <exception cref="ExactArgumentException">Unknown names, not a Lyndon word, or degree beyond the truncation order.</exception>
    public Rational CoefficientOf(params string[] letters) => CoefficientOf(LyndonWord.Create(Algebra.Alphabet.Spell(letters)));

    /// <summary>The homogeneous part of a degree, as an exact element.</summary>
    /// <exception cref="ExactArgumentException">The degree is below 1 or not below the truncation order.</exception>
    public LieSeries DegreePart(int degree)
    {
        if (degree < 1 || degree >= Order)
        {
            throw new ExactArgumentException(
                degree < 1
                    ? $"Degree {degree} is not a degree of a Lie element (degrees start at 1)."
                    : $"Degree {degree} is unknown: the series is truncated at order {Order} (known degrees 1..{Order - 1}).",
                nameof(degree));
        }

        return new LieSeries(Algebra, _terms.Where(t => t.Word.Degree == degree), int.MaxValue);
    }

    /// <summary>The number of non-zero coordinates of a degree.</summary>
    /// <exception cref="ExactArgumentException">The degree is below 1 or not below the truncation order.</exception>
    public int NonZeroCount(int degree)
    {
        if (degree < 1 || degree >= Order)
        {
            throw new ExactArgumentException($"Degree {degree} is outside the known degrees of this series (truncated at order {Order}).", nameof(degree));
        }

        return _terms.Count(t => t.Word.Degree == degree);
    }

    /// <summary>Drops the terms of degree at least <paramref name="order"/> and records the truncation.</summary>
    /// <exception cref="ExactArgumentException">Order below 1.</exception>
    public LieSeries Truncate(int order)
    {
        if (order < 1)
        {
            throw new ExactArgumentException($"Truncation order {order} must be at least 1.", nameof(order));
        }

        return new LieSeries(Algebra, _terms, Math.Min(order, Order));
    }

    /// <summary>Sum; the truncation order is the smaller one.</summary>
    /// <exception cref="ExactArgumentException">Elements of different free Lie algebras.</exception>
    public static LieSeries operator +(LieSeries left, LieSeries right)
    {
        RequireSameAlgebra(left, right);
        return new LieSeries(left.Algebra, left._terms.Concat(right._terms), Math.Min(left.Order, right.Order));
    }

    /// <summary>Difference; the truncation order is the smaller one.</summary>
    /// <exception cref="ExactArgumentException">Elements of different free Lie algebras.</exception>
    public static LieSeries operator -(LieSeries left, LieSeries right) => left + (-right);

    /// <summary>Negation.</summary>
    public static LieSeries operator -(LieSeries value) => Rational.MinusOne * value;

    /// <summary>Scalar multiple.</summary>
    public static LieSeries operator *(Rational factor, LieSeries value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return new LieSeries(value.Algebra, value._terms.Select(t => (t.Word, t.Coefficient * factor)), value.Order);
    }

    /// <summary>
    /// The Lie bracket [a, b], rewritten into the Lyndon basis. For truncated inputs the result is known below
    /// min(Order(a) + MinDegree(b), Order(b) + MinDegree(a)). Cost: the product of the expansions in the free
    /// associative algebra plus a triangular projection per degree.
    /// </summary>
    /// <exception cref="ExactArgumentException">Elements of different free Lie algebras.</exception>
    public static LieSeries Bracket(LieSeries a, LieSeries b)
    {
        RequireSameAlgebra(a, b);
        var order = Math.Min(
            a.IsExact ? int.MaxValue : SaturatingAdd(a.Order, LowestDegree(b)),
            b.IsExact ? int.MaxValue : SaturatingAdd(b.Order, LowestDegree(a)));
        if (a.IsZero || b.IsZero)
        {
            return new LieSeries(a.Algebra, [], order);
        }

        var maxDegree = Math.Min(order == int.MaxValue ? Word.MaxLength : order - 1, Word.MaxLength);
        if (a.MaxDegree + b.MaxDegree > Word.MaxLength && order == int.MaxValue)
        {
            throw new ExactArgumentException($"The bracket would have degree {a.MaxDegree + b.MaxDegree}, beyond the limit of {Word.MaxLength}.", nameof(b));
        }

        var ea = a.Algebra.Expand(a);
        var eb = a.Algebra.Expand(b);
        var commutator = AssociativeElement.MultiplyTruncated(ea, eb, maxDegree) - AssociativeElement.MultiplyTruncated(eb, ea, maxDegree);
        if (!a.Algebra.TryToLyndonBasisCore(commutator.TermsCore, out var terms, out var failed))
        {
            throw new InvalidOperationException($"Internal error: the commutator has a degree-{failed} part outside the free Lie algebra.");
        }

        return new LieSeries(a.Algebra, terms, order);
    }

    /// <summary>Equal algebra, equal truncation order and equal known terms.</summary>
    public bool Equals(LieSeries? other)
    {
        if (other is null || !Algebra.Equals(other.Algebra) || Order != other.Order || _terms.Length != other._terms.Length)
        {
            return false;
        }

        for (var i = 0; i < _terms.Length; i++)
        {
            if (_terms[i].Word != other._terms[i].Word || _terms[i].Coefficient != other._terms[i].Coefficient)
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as LieSeries);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.Add(Order);
        foreach (var (w, c) in _terms)
        {
            hash.Add(w);
            hash.Add(c);
        }

        return hash.ToHashCode();
    }

    /// <summary>
    /// Plain text by degree, basis elements as standard bracketings, e.g. "X + Y + 1/2 [X, Y] + O(degree 3)";
    /// "0" for an exact zero.
    /// </summary>
    public override string ToString()
    {
        var builder = new StringBuilder();
        foreach (var (w, c) in _terms)
        {
            TermText.Append(builder, c, Algebra.FormatBasisElement(w), termIsOne: false);
        }

        if (!IsExact)
        {
            builder.Append(builder.Length == 0 ? $"O(degree {Order})" : $" + O(degree {Order})");
        }

        return builder.Length == 0 ? "0" : builder.ToString();
    }

    internal IEnumerable<(LyndonWord Word, Rational Coefficient)> TermsCore => _terms;

    // The lowest degree a term of the series can have, known or unknown (int.MaxValue for an exact zero).
    private static int LowestDegree(LieSeries s) => s.IsZero ? s.Order : s.MinDegree;

    private static int SaturatingAdd(int a, int b) => (long)a + b >= int.MaxValue ? int.MaxValue : a + b;

    private static void RequireSameAlgebra(LieSeries left, LieSeries right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (!left.Algebra.Equals(right.Algebra))
        {
            throw new ExactArgumentException($"Cannot combine an element of the {left.Algebra} with one of the {right.Algebra}.", nameof(right));
        }
    }
}
