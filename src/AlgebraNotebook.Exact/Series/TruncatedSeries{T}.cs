using System.Collections.ObjectModel;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Series;

/// <summary>
/// A multivariate power series in named small parameters, known up to a total order: the known terms are exact,
/// and every term of total degree at least <see cref="Order"/> is unknown (written O(order)). Sealed and immutable.
/// </summary>
/// <remarks>
/// <para>
/// Conventions. <see cref="Terms"/> lists the known non-zero terms in ascending total degree; within one degree
/// they are in descending <see cref="MonomialOrder.Default"/> (so x^2, x*y, y^2 when x was used first).
/// <see cref="Order"/> is <see cref="ExactOrder"/> (<see cref="int.MaxValue"/>) when nothing is unknown.
/// <see cref="Parameters"/> are the small parameters the unknown tail is measured in: those of the inputs a series was
/// built from, plus the symbols of its terms. They are carried along even by exact results (so that (a*b)*c and
/// a*(b*c) agree in every case), but for an exact series they are not part of equality. A series without parameters
/// is a constant and therefore exact.
/// </para>
/// <para>
/// Big-O arithmetic: combining two series (+, -, *) gives the minimum of the two orders and the union of the
/// parameters, so the working order chosen when the parameters were built is kept. <see cref="Zero"/> and
/// <see cref="One"/> are exact and combine with any series; multiplying by an exact zero gives an exact zero.
/// </para>
/// <para>
/// Coefficients may be any Q-algebra element (rationals, Gaussian rationals, polynomials, even series). The parameters
/// commute with the coefficients; products keep the left factor's coefficient on the left. The recurrences behind
/// Exp, Log, Sin, Cos, Reciprocal and fractional powers assume commuting coefficients, as <see cref="IRingElement{T}"/>
/// promises.
/// </para>
/// </remarks>
/// <example><c>TruncatedSeries&lt;Rational&gt;.Parameter("t", 3).Exp().ToString() == "1 + t + 1/2*t^2 + O(t^3)"</c></example>
/// <typeparam name="T">The coefficient type.</typeparam>
public sealed partial class TruncatedSeries<T> : IRationalAlgebraElement<TruncatedSeries<T>>
    where T : IRationalAlgebraElement<T>
{
    /// <summary>The value of <see cref="Order"/> for an exact series (nothing unknown): <see cref="int.MaxValue"/>.</summary>
    public const int ExactOrder = int.MaxValue;

    private static readonly (Monomial Monomial, T Coefficient)[] NoTerms = [];
    private static readonly Symbol[] NoSymbols = [];
    private static readonly TruncatedSeries<T> ZeroValue = new(NoTerms, ExactOrder, NoSymbols);
    private static readonly TruncatedSeries<T> OneValue = new([(Monomial.One, T.One)], ExactOrder, NoSymbols);

    private readonly (Monomial Monomial, T Coefficient)[] _terms;
    private readonly Symbol[] _parameters;
    private ReadOnlyCollection<(Monomial Monomial, T Coefficient)>? _termsView;
    private ReadOnlyCollection<Symbol>? _parametersView;
    private int _hash;

    private TruncatedSeries((Monomial Monomial, T Coefficient)[] canonicalTerms, int order, Symbol[] canonicalParameters)
    {
        _terms = canonicalTerms;
        Order = order;
        _parameters = canonicalParameters;
    }

    /// <summary>
    /// The known non-zero terms, in ascending total degree (within a degree: descending <see cref="MonomialOrder.Default"/>).
    /// </summary>
    public IReadOnlyList<(Monomial Monomial, T Coefficient)> Terms => _termsView ??= Array.AsReadOnly(_terms);

    /// <summary>
    /// Terms of total degree at least <see cref="Order"/> are unknown; <see cref="ExactOrder"/> (<see cref="int.MaxValue"/>)
    /// when the series is exact.
    /// </summary>
    public int Order { get; }

    /// <summary>The small parameters, in the canonical symbol order (by name).</summary>
    public IReadOnlyList<Symbol> Parameters => _parametersView ??= Array.AsReadOnly(_parameters);

    /// <summary>True when nothing is unknown (<see cref="Order"/> is <see cref="ExactOrder"/>).</summary>
    public bool IsExact => Order == ExactOrder;

    /// <summary>The exact zero series.</summary>
    public static TruncatedSeries<T> Zero => ZeroValue;

    /// <summary>The exact series 1.</summary>
    public static TruncatedSeries<T> One => OneValue;

    /// <summary>True for the exact zero series only (a series O(x^3) is unknown, not zero).</summary>
    public bool IsZero => _terms.Length == 0 && Order == ExactOrder;

    /// <summary>True for the exact series 1 only.</summary>
    public bool IsOne => Order == ExactOrder && _terms.Length == 1 && _terms[0].Monomial.IsOne && _terms[0].Coefficient.IsOne;

    /// <summary>
    /// The coefficient of the monomial 1.
    /// </summary>
    /// <exception cref="ExactArgumentException">The order is 0, so even the constant term is unknown.</exception>
    public T ConstantTerm
    {
        get
        {
            if (Order == 0)
            {
                throw new ExactArgumentException($"The constant term of {this} is unknown (the series is known to order 0).", nameof(ConstantTerm));
            }

            return ConstantTermCore;
        }
    }

    private bool IsBareZero => IsZero && _parameters.Length == 0;

    private bool IsBareOne => IsOne && _parameters.Length == 0;

    private T ConstantTermCore => _terms.Length > 0 && _terms[0].Monomial.IsOne ? _terms[0].Coefficient : T.Zero;

    /// <summary>The small parameter <paramref name="parameter"/> itself, with terms of total degree &gt;= <paramref name="order"/> unknown.</summary>
    /// <param name="parameter">The parameter.</param>
    /// <param name="order">The working order, at least 1. Example: order 3 gives "t + O(t^3)".</param>
    /// <exception cref="ExactArgumentException">The order is below 1.</exception>
    public static TruncatedSeries<T> Parameter(Symbol parameter, int order)
    {
        ArgumentNullException.ThrowIfNull(parameter);
        if (order < 1)
        {
            throw new ExactArgumentException($"The order {order} for the parameter {parameter} must be at least 1.", nameof(order));
        }

        return Create([(Monomial.Of(parameter), T.One)], order, [parameter]);
    }

    /// <summary>The small parameter named <paramref name="name"/>, see <see cref="Parameter(Symbol, int)"/>.</summary>
    /// <exception cref="ExactArgumentException">The name is not a valid symbol name, or the order is below 1.</exception>
    public static TruncatedSeries<T> Parameter(string name, int order) => Parameter(Symbol.Of(name), order);

    /// <summary>The exact constant series <paramref name="value"/>.</summary>
    public static TruncatedSeries<T> Constant(T value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.IsZero ? ZeroValue : new TruncatedSeries<T>([(Monomial.One, value)], ExactOrder, NoSymbols);
    }

    /// <summary>
    /// Builds a series from terms (any order; repeated monomials add; zero coefficients and terms of total degree
    /// &gt;= <paramref name="order"/> are dropped).
    /// </summary>
    /// <param name="terms">The known terms.</param>
    /// <param name="order">Terms of total degree &gt;= order are unknown; <see cref="ExactOrder"/> for an exact series.</param>
    /// <param name="parameters">Extra parameters the unknown tail is measured in (the symbols of the terms are always included).</param>
    /// <exception cref="ExactArgumentException">The order is negative.</exception>
    public static TruncatedSeries<T> FromTerms(IEnumerable<(Monomial Monomial, T Coefficient)> terms, int order, IEnumerable<Symbol>? parameters = null)
    {
        ArgumentNullException.ThrowIfNull(terms);
        if (order < 0)
        {
            throw new ExactArgumentException($"The order {order} is negative; use 0 (nothing known) or more.", nameof(order));
        }

        var collected = terms.ToList();
        foreach (var (monomial, coefficient) in collected)
        {
            if (monomial is null || coefficient is null)
            {
                throw new ExactArgumentException("A term of the series has a null monomial or coefficient.", nameof(terms));
            }
        }

        return Create(collected, order, parameters?.ToList() ?? []);
    }

    /// <inheritdoc />
    public static TruncatedSeries<T> FromInteger(System.Numerics.BigInteger value) => Constant(T.FromInteger(value));

    /// <inheritdoc />
    public static TruncatedSeries<T> FromRational(Rational value) => Constant(T.FromRational(value));

    /// <summary>
    /// The series with the same known terms below <paramref name="order"/> and order min(<see cref="Order"/>, order).
    /// </summary>
    /// <exception cref="ExactArgumentException">The order is negative.</exception>
    public TruncatedSeries<T> Truncate(int order)
    {
        if (order < 0)
        {
            throw new ExactArgumentException($"Cannot truncate {this} to the negative order {order}.", nameof(order));
        }

        return order >= Order ? this : Create(_terms, order, _parameters);
    }

    /// <summary>The coefficient of <paramref name="monomial"/> (zero when the term is absent).</summary>
    /// <exception cref="ExactArgumentException">The monomial has total degree &gt;= <see cref="Order"/>, so its coefficient is unknown.</exception>
    public T Coefficient(Monomial monomial)
    {
        ArgumentNullException.ThrowIfNull(monomial);
        if (monomial.TotalDegree >= Order)
        {
            throw new ExactArgumentException(
                $"The coefficient of {monomial} in {this} is unknown: the series is known below total degree {Order} only.", nameof(monomial));
        }

        foreach (var (m, c) in _terms)
        {
            if (m.TotalDegree > monomial.TotalDegree)
            {
                break;
            }

            if (m.Equals(monomial))
            {
                return c;
            }
        }

        return T.Zero;
    }

    /// <summary>
    /// True when this series and <paramref name="other"/> could be the same series: their known coefficients agree
    /// for every monomial of total degree below the smaller of the two orders.
    /// </summary>
    public bool AgreesWith(TruncatedSeries<T> other)
    {
        ArgumentNullException.ThrowIfNull(other);
        var limit = Math.Min(Order, other.Order);
        var difference = new Dictionary<Monomial, T>();
        foreach (var (m, c) in _terms)
        {
            if (m.TotalDegree < limit)
            {
                difference[m] = c;
            }
        }

        foreach (var (m, c) in other._terms)
        {
            if (m.TotalDegree < limit)
            {
                difference[m] = difference.TryGetValue(m, out var old) ? old - c : -c;
            }
        }

        return difference.Values.All(c => c.IsZero);
    }

    /// <summary>The series with every coefficient conjugated; the parameters are treated as real.</summary>
    public TruncatedSeries<T> Conjugate() =>
        new(_terms.Select(t => (t.Monomial, t.Coefficient.Conjugate())).ToArray(), Order, _parameters);

    /// <summary>
    /// Equality: same known terms and same order; for a series that is not exact also the same parameters
    /// (O(x^3) and O((x, y)^3) are different statements). Use <see cref="AgreesWith"/> for consistency up to order.
    /// </summary>
    public bool Equals(TruncatedSeries<T>? other)
    {
        if (ReferenceEquals(this, other))
        {
            return true;
        }

        if (other is null || other.Order != Order || other._terms.Length != _terms.Length)
        {
            return false;
        }

        // The parameters say in which symbols the unknown tail is measured; an exact series has no tail.
        if (Order != ExactOrder)
        {
            if (other._parameters.Length != _parameters.Length)
            {
                return false;
            }

            for (var k = 0; k < _parameters.Length; k++)
            {
                if (!ReferenceEquals(_parameters[k], other._parameters[k]))
                {
                    return false;
                }
            }
        }

        for (var k = 0; k < _terms.Length; k++)
        {
            if (!_terms[k].Monomial.Equals(other._terms[k].Monomial) || !_terms[k].Coefficient.Equals(other._terms[k].Coefficient))
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as TruncatedSeries<T>);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        if (_hash == 0)
        {
            var hash = new HashCode();
            hash.Add(Order);
            if (Order != ExactOrder)
            {
                foreach (var p in _parameters)
                {
                    hash.Add(p.Id);
                }
            }

            foreach (var (m, c) in _terms)
            {
                hash.Add(m);
                hash.Add(c);
            }

            var value = hash.ToHashCode();
            _hash = value == 0 ? 1 : value;
        }

        return _hash;
    }

    /// <summary>Equality as in <see cref="Equals(TruncatedSeries{T})"/>.</summary>
    public static bool operator ==(TruncatedSeries<T>? left, TruncatedSeries<T>? right) =>
        left is null ? right is null : left.Equals(right);

    /// <summary>Negation of <see cref="op_Equality"/>.</summary>
    public static bool operator !=(TruncatedSeries<T>? left, TruncatedSeries<T>? right) => !(left == right);

    /// <summary>
    /// Builds the canonical series: drops zero coefficients and terms of degree &gt;= order, adds repeated monomials,
    /// sorts, and settles the parameter list (the given ones plus the symbols of the terms; no parameters: exact).
    /// </summary>
    internal static TruncatedSeries<T> Create(IEnumerable<(Monomial Monomial, T Coefficient)> terms, int order, IEnumerable<Symbol> parameters)
    {
        var sums = new Dictionary<Monomial, T>();
        foreach (var (m, c) in terms)
        {
            if (m.TotalDegree >= order || c.IsZero)
            {
                continue;
            }

            sums[m] = sums.TryGetValue(m, out var old) ? old + c : c;
        }

        return FromSums(sums, order, parameters);
    }

    /// <summary>Like <see cref="Create"/> for a dictionary of already added coefficients (all of degree &lt; order).</summary>
    internal static TruncatedSeries<T> FromSums(Dictionary<Monomial, T> sums, int order, IEnumerable<Symbol> parameters)
    {
        var kept = new List<(Monomial Monomial, T Coefficient)>(sums.Count);
        foreach (var (m, c) in sums)
        {
            if (!c.IsZero && m.TotalDegree < order)
            {
                kept.Add((m, c));
            }
        }

        kept.Sort(static (a, b) => CompareMonomials(a.Monomial, b.Monomial));
        var symbols = new HashSet<Symbol>(parameters);

        foreach (var (m, _) in kept)
        {
            foreach (var (s, _) in m.Factors)
            {
                symbols.Add(s);
            }
        }

        if (symbols.Count == 0)
        {
            if (order > 0)
            {
                order = ExactOrder;
            }

            if (order == ExactOrder && kept.Count == 0)
            {
                return ZeroValue;
            }
        }

        var parameterArray = symbols.Count == 0 ? NoSymbols : symbols.Order().ToArray();
        return new TruncatedSeries<T>(kept.ToArray(), order, parameterArray);
    }

    /// <summary>The term order: ascending total degree, then descending <see cref="MonomialOrder.Default"/>.</summary>
    internal static int CompareMonomials(Monomial a, Monomial b)
    {
        if (a.TotalDegree != b.TotalDegree)
        {
            return a.TotalDegree.CompareTo(b.TotalDegree);
        }

        return -MonomialOrder.Default.Compare(a, b);
    }
}
