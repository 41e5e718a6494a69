using System.Numerics;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// A multivariate polynomial with exact coefficients in the field <typeparamref name="T"/> (Rational or
/// GaussianRational). Immutable and canonical: terms have distinct monomials and non-zero coefficients and are kept
/// sorted in DESCENDING <see cref="MonomialOrder.Default"/> order (graded reverse lexicographic, symbols ranked by
/// name), so equal polynomials have equal term lists.
/// </summary>
/// <remarks>
/// Being a class, <c>default(Polynomial&lt;T&gt;)</c> is null; use the shared instance <see cref="Zero"/>.
/// Variables are treated as real by <see cref="Conjugate"/>.
/// </remarks>
/// <example><c>Polynomial&lt;Rational&gt;.Parse("(x + y)^2") == Polynomial&lt;Rational&gt;.Parse("x^2 + 2 x y + y^2")</c></example>
/// <typeparam name="T">The coefficient field.</typeparam>
public sealed partial class Polynomial<T> :
    IRationalAlgebraElement<Polynomial<T>>,
    IExactDivision<Polynomial<T>>
    where T : IFieldElement<T>
{
    private static readonly Polynomial<T> ZeroInstance = new([], []);
    private static readonly Polynomial<T> OneInstance = new([Monomial.One], [T.One]);

    private readonly Monomial[] _monomials;
    private readonly T[] _coefficients;
    private (Monomial Monomial, T Coefficient)[]? _terms;
    private int _hash; // 0 = not yet computed; a computed 0 is stored as 1

    // Callers guarantee: sorted descending under MonomialOrder.Default, distinct monomials, no zero coefficients.
    private Polynomial(Monomial[] monomials, T[] coefficients)
    {
        _monomials = monomials;
        _coefficients = coefficients;
    }

    /// <summary>The zero polynomial (a shared instance with no terms).</summary>
    public static Polynomial<T> Zero => ZeroInstance;

    /// <summary>The constant polynomial 1.</summary>
    public static Polynomial<T> One => OneInstance;

    /// <summary>
    /// The terms in DESCENDING <see cref="MonomialOrder.Default"/> order; no zero coefficients; empty for zero.
    /// </summary>
    public IReadOnlyList<(Monomial Monomial, T Coefficient)> Terms => _terms ??= BuildTerms();

    /// <summary>The number of terms.</summary>
    public int TermCount => _monomials.Length;

    /// <inheritdoc />
    public bool IsZero => _monomials.Length == 0;

    /// <inheritdoc />
    public bool IsOne => _monomials.Length == 1 && _monomials[0].IsOne && _coefficients[0].IsOne;

    /// <summary>True when the polynomial has no variables (zero counts as constant).</summary>
    public bool IsConstant => _monomials.Length == 0 || (_monomials.Length == 1 && _monomials[0].IsOne);

    /// <summary>The coefficient of the monomial 1 (zero when there is none).</summary>
    public T ConstantTerm =>
        _monomials.Length > 0 && _monomials[^1].IsOne ? _coefficients[^1] : T.Zero;

    /// <summary>The symbols that occur with a positive exponent in some term.</summary>
    public IReadOnlySet<Symbol> Symbols
    {
        get
        {
            var set = new HashSet<Symbol>();
            foreach (var m in _monomials)
            {
                foreach (var s in m.SymbolArray)
                {
                    set.Add(s);
                }
            }

            return set;
        }
    }

    /// <summary>
    /// The largest total degree of a term; -1 for the zero polynomial (convention of this library), 0 for non-zero constants.
    /// </summary>
    public int TotalDegree
    {
        get
        {
            var degree = -1;
            foreach (var m in _monomials)
            {
                degree = Math.Max(degree, m.TotalDegree);
            }

            return degree;
        }
    }

    internal Monomial[] MonomialArray => _monomials;

    internal T[] CoefficientArray => _coefficients;

    /// <summary>The polynomial consisting of the variable named <paramref name="name"/>.</summary>
    /// <exception cref="ExactArgumentException">The name is not a valid symbol name.</exception>
    public static Polynomial<T> Variable(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        return Variable(Symbol.Of(name));
    }

    /// <summary>The polynomial consisting of the variable <paramref name="symbol"/>.</summary>
    public static Polynomial<T> Variable(Symbol symbol)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        return new Polynomial<T>([Monomial.Of(symbol)], [T.One]);
    }

    /// <summary>The constant polynomial <paramref name="value"/> (zero gives <see cref="Zero"/>).</summary>
    public static Polynomial<T> Constant(T value) => value.IsZero ? ZeroInstance : new Polynomial<T>([Monomial.One], [value]);

    /// <summary>The single term <paramref name="coefficient"/>*<paramref name="monomial"/>.</summary>
    public static Polynomial<T> Term(T coefficient, Monomial monomial)
    {
        ArgumentNullException.ThrowIfNull(monomial);
        return coefficient.IsZero ? ZeroInstance : new Polynomial<T>([monomial], [coefficient]);
    }

    /// <summary>The sum of the given terms, in any order; repeated monomials are added, zero results dropped.</summary>
    public static Polynomial<T> FromTerms(IEnumerable<(Monomial Monomial, T Coefficient)> terms)
    {
        ArgumentNullException.ThrowIfNull(terms);
        var sums = new Dictionary<Monomial, T>();
        foreach (var (m, c) in terms)
        {
            ArgumentNullException.ThrowIfNull(m, nameof(terms));
            sums[m] = sums.TryGetValue(m, out var old) ? old + c : c;
        }

        return FromArrays(TermArithmetic<T>.FromUnsorted(sums, MonomialOrder.Default));
    }

    /// <inheritdoc />
    public static Polynomial<T> FromInteger(BigInteger value) => Constant(T.FromInteger(value));

    /// <inheritdoc />
    public static Polynomial<T> FromRational(Rational value) => Constant(T.FromRational(value));

    /// <summary>Builds from arrays already sorted by the default order (internal fast path).</summary>
    internal static Polynomial<T> FromArrays((Monomial[] Monomials, T[] Coefficients) terms) =>
        terms.Monomials.Length == 0 ? ZeroInstance : new Polynomial<T>(terms.Monomials, terms.Coefficients);

    /// <summary>Builds from arrays sorted under <paramref name="order"/> (re-sorted when it is not the default).</summary>
    internal static Polynomial<T> FromOrderedArrays(Monomial[] monomials, T[] coefficients, MonomialOrder order) =>
        ReferenceEquals(order, MonomialOrder.Default)
            ? FromArrays((monomials, coefficients))
            : FromArrays(TermArithmetic<T>.Resort(monomials, coefficients, MonomialOrder.Default));

    /// <summary>The coefficient of <paramref name="monomial"/> (zero when absent).</summary>
    public T CoefficientOf(Monomial monomial)
    {
        ArgumentNullException.ThrowIfNull(monomial);
        var index = Array.BinarySearch(_monomials, monomial, MonomialOrder.Default.Descending);
        return index >= 0 ? _coefficients[index] : T.Zero;
    }

    /// <summary>The largest exponent of <paramref name="symbol"/> in any term; -1 for the zero polynomial.</summary>
    public int DegreeIn(Symbol symbol)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        if (IsZero)
        {
            return -1;
        }

        var degree = 0;
        foreach (var m in _monomials)
        {
            degree = Math.Max(degree, m.ExponentOf(symbol));
        }

        return degree;
    }

    /// <summary>The largest term under <paramref name="order"/> (default: <see cref="MonomialOrder.Default"/>).</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero (it has no leading term).</exception>
    public (Monomial Monomial, T Coefficient) LeadingTerm(MonomialOrder? order = null)
    {
        if (IsZero)
        {
            throw new ExactArgumentException("The zero polynomial has no leading term.", "this");
        }

        order ??= MonomialOrder.Default;
        var best = 0;
        if (!ReferenceEquals(order, MonomialOrder.Default))
        {
            for (var k = 1; k < _monomials.Length; k++)
            {
                if (order.CompareCore(_monomials[k], _monomials[best]) > 0)
                {
                    best = k;
                }
            }
        }

        return (_monomials[best], _coefficients[best]);
    }

    /// <summary>The monomial of <see cref="LeadingTerm"/> under <paramref name="order"/>.</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    public Monomial LeadingMonomial(MonomialOrder? order = null) => LeadingTerm(order).Monomial;

    /// <summary>The coefficient of <see cref="LeadingTerm"/> under <paramref name="order"/>.</summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    public T LeadingCoefficient(MonomialOrder? order = null) => LeadingTerm(order).Coefficient;

    /// <summary>Mathematical equality (same terms).</summary>
    public bool Equals(Polynomial<T>? other)
    {
        if (ReferenceEquals(this, other))
        {
            return true;
        }

        if (other is null || other._monomials.Length != _monomials.Length || other.GetHashCode() != GetHashCode())
        {
            return false;
        }

        for (var k = 0; k < _monomials.Length; k++)
        {
            if (!_monomials[k].Equals(other._monomials[k]) || !_coefficients[k].Equals(other._coefficients[k]))
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as Polynomial<T>);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        if (_hash == 0)
        {
            var hash = new HashCode();
            for (var k = 0; k < _monomials.Length; k++)
            {
                hash.Add(_monomials[k]);
                hash.Add(_coefficients[k]);
            }

            var value = hash.ToHashCode();
            _hash = value == 0 ? 1 : value;
        }

        return _hash;
    }

    /// <summary>Equality of polynomials (null equals only null).</summary>
    public static bool operator ==(Polynomial<T>? left, Polynomial<T>? right) =>
        left is null ? right is null : left.Equals(right);

    /// <summary>Inequality of polynomials.</summary>
    public static bool operator !=(Polynomial<T>? left, Polynomial<T>? right) => !(left == right);

    private (Monomial Monomial, T Coefficient)[] BuildTerms()
    {
        var terms = new (Monomial, T)[_monomials.Length];
        for (var k = 0; k < terms.Length; k++)
        {
            terms[k] = (_monomials[k], _coefficients[k]);
        }

        return terms;
    }
}
