using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Series;

/// <summary>Operations on truncated series that need more of the coefficients than a Q-algebra (a field).</summary>
public static class TruncatedSeries
{
    /// <summary>
    /// 1/f for field coefficients: the constant term c must be non-zero; the result has the same order and parameters.
    /// Cost: about one series product (see <see cref="TruncatedSeries{T}.Reciprocal(T)"/>).
    /// </summary>
    /// <exception cref="DivideByZeroException">The constant term is zero.</exception>
    /// <exception cref="ExactArgumentException">The constant term is unknown, or f is exact but not a constant.</exception>
    public static TruncatedSeries<TField> Reciprocal<TField>(this TruncatedSeries<TField> series)
        where TField : IFieldElement<TField>
    {
        ArgumentNullException.ThrowIfNull(series);
        if (series.Order == 0)
        {
            throw new ExactArgumentException($"Cannot invert {series}: its constant term is unknown (order 0).", nameof(series));
        }

        var c = series.ConstantTerm;
        if (c.IsZero)
        {
            throw new DivideByZeroException($"Cannot invert {series}: its constant term is zero, so 1/f is not a power series.");
        }

        return series.Reciprocal(c.Reciprocal());
    }

    /// <summary>numerator * (1/denominator) for field coefficients; see <see cref="Reciprocal{TField}(TruncatedSeries{TField})"/>.</summary>
    /// <exception cref="DivideByZeroException">The denominator's constant term is zero.</exception>
    public static TruncatedSeries<TField> Divide<TField>(this TruncatedSeries<TField> numerator, TruncatedSeries<TField> denominator)
        where TField : IFieldElement<TField>
    {
        ArgumentNullException.ThrowIfNull(numerator);
        ArgumentNullException.ThrowIfNull(denominator);
        if (denominator.Order != 0 && denominator.ConstantTerm.IsZero)
        {
            throw new DivideByZeroException($"Cannot divide {numerator} by {denominator}: the divisor's constant term is zero.");
        }

        return numerator * denominator.Reciprocal();
    }
}
