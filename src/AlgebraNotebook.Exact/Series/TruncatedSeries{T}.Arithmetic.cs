using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Series;

public sealed partial class TruncatedSeries<T>
{
    /// <summary>Sum; the order is the smaller of the two orders, the parameters the union.</summary>
    public static TruncatedSeries<T> operator +(TruncatedSeries<T> left, TruncatedSeries<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        // Shortcuts only for the bare constants: an exact zero may still carry parameters that the sum must keep.
        if (right.IsBareZero)
        {
            return left;
        }

        if (left.IsBareZero)
        {
            return right;
        }

        return Create(left._terms.Concat(right._terms), Math.Min(left.Order, right.Order), left._parameters.Concat(right._parameters));
    }

    /// <summary>Difference; the order is the smaller of the two orders, the parameters the union.</summary>
    public static TruncatedSeries<T> operator -(TruncatedSeries<T> left, TruncatedSeries<T> right)
    {
        ArgumentNullException.ThrowIfNull(right);
        return left + (-right);
    }

    /// <summary>Negation (same order and parameters).</summary>
    public static TruncatedSeries<T> operator -(TruncatedSeries<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.IsZero ? value : new TruncatedSeries<T>(value._terms.Select(t => (t.Monomial, -t.Coefficient)).ToArray(), value.Order, value._parameters);
    }

    /// <summary>
    /// Product, truncated at the smaller of the two orders (so 0 * (x + O(x^3)) is O(x^3): the rule is applied uniformly,
    /// which keeps distributivity exact). Cost: one coefficient product per pair of known terms whose degrees add up to
    /// less than that order.
    /// </summary>
    public static TruncatedSeries<T> operator *(TruncatedSeries<T> left, TruncatedSeries<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (right.IsBareOne)
        {
            return left;
        }

        if (left.IsBareOne)
        {
            return right;
        }

        var order = Math.Min(left.Order, right.Order);
        return FromSums(MultiplyTerms(left._terms, right._terms, order), order, left._parameters.Concat(right._parameters));
    }

    /// <summary>
    /// Every coefficient multiplied on the left by <paramref name="scalar"/>; same order and parameters (as for the
    /// product with the constant series <paramref name="scalar"/>).
    /// </summary>
    public static TruncatedSeries<T> operator *(T scalar, TruncatedSeries<T> series)
    {
        ArgumentNullException.ThrowIfNull(scalar);
        ArgumentNullException.ThrowIfNull(series);
        return Create(series._terms.Select(t => (t.Monomial, scalar * t.Coefficient)), series.Order, series._parameters);
    }

    /// <summary>
    /// Every coefficient multiplied on the right by <paramref name="scalar"/>; same order and parameters (as for the
    /// product with the constant series <paramref name="scalar"/>).
    /// </summary>
    public static TruncatedSeries<T> operator *(TruncatedSeries<T> series, T scalar)
    {
        ArgumentNullException.ThrowIfNull(scalar);
        ArgumentNullException.ThrowIfNull(series);
        return Create(series._terms.Select(t => (t.Monomial, t.Coefficient * scalar)), series.Order, series._parameters);
    }

    /// <summary>This series times a rational factor; same order and parameters (so Scale(0) of x + O(x^3) is O(x^3)).</summary>
    public TruncatedSeries<T> Scale(Rational factor)
    {
        return factor.IsOne ? this : Create(_terms.Select(t => (t.Monomial, t.Coefficient.Scale(factor))), Order, _parameters);
    }

    /// <summary>
    /// Integer power by repeated squaring, truncated at <see cref="Order"/>; the 0-th power is the exact 1.
    /// A negative exponent needs the constant term to be its own inverse (1 or -1); for field coefficients use
    /// <see cref="TruncatedSeries.Reciprocal{TField}(TruncatedSeries{TField})"/> first.
    /// </summary>
    /// <exception cref="ExactArgumentException">Negative exponent and the constant term is not 1 or -1.</exception>
    public TruncatedSeries<T> Pow(int exponent)
    {
        if (exponent < 0)
        {
            if (Order == 0 || !(ConstantTermCore * ConstantTermCore).IsOne)
            {
                throw new ExactArgumentException(
                    $"Cannot raise {this} to the negative power {exponent}: the constant term must be invertible in the coefficient ring; " +
                    "this method inverts only 1 and -1 (for field coefficients, take TruncatedSeries.Reciprocal first).", nameof(exponent));
            }

            return Reciprocal(ConstantTermCore).Pow(-(long)exponent);
        }

        return Pow((long)exponent);
    }

    private TruncatedSeries<T> Pow(long exponent)
    {
        return Powers.BySquaring(OneValue, this, exponent);
    }

    /// <summary>
    /// Partial derivative with respect to <paramref name="parameter"/>. The unknown tail O(order) becomes O(order - 1);
    /// a symbol that is not a parameter gives the exact zero.
    /// </summary>
    public TruncatedSeries<T> Derivative(Symbol parameter)
    {
        ArgumentNullException.ThrowIfNull(parameter);
        if (!_parameters.Contains(parameter))
        {
            return ZeroValue;
        }

        var terms = new List<(Monomial, T)>();
        foreach (var (m, c) in _terms)
        {
            var e = m.ExponentOf(parameter);
            if (e > 0)
            {
                terms.Add((m.DivideBy(Monomial.Of(parameter)), c * T.FromInteger(e)));
            }
        }

        var order = Order == ExactOrder ? ExactOrder : Math.Max(Order - 1, 0);
        return Create(terms, order, _parameters);
    }

    /// <summary>Accumulates the products of all pairs of terms whose degrees add up to less than <paramref name="order"/>.</summary>
    internal static Dictionary<Monomial, T> MultiplyTerms(
        IReadOnlyList<(Monomial Monomial, T Coefficient)> left, IReadOnlyList<(Monomial Monomial, T Coefficient)> right, int order)
    {
        var sums = new Dictionary<Monomial, T>();
        foreach (var (ml, cl) in left)
        {
            var degree = ml.TotalDegree;
            if (degree >= order)
            {
                break;
            }

            foreach (var (mr, cr) in right)
            {
                if ((long)degree + mr.TotalDegree >= order)
                {
                    break;
                }

                var m = ml * mr;
                var c = cl * cr;
                sums[m] = sums.TryGetValue(m, out var old) ? old + c : c;
            }
        }

        return sums;
    }
}
