using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// Arithmetic on sparse term arrays sorted in descending order under a given monomial order, without zero
/// coefficients. Shared by <see cref="Polynomial{T}"/> (sorted by <see cref="MonomialOrder.Default"/>) and the
/// Groebner-basis code (sorted by the ring's order).
/// </summary>
internal static class TermArithmetic<T>
    where T : IFieldElement<T>
{
    /// <summary>
    /// Returns a[aStart..] + factor * shift * b, merged in descending order. <paramref name="factor"/> must be non-zero.
    /// Multiplying by a monomial keeps the order of b's terms (monomial orders are compatible with multiplication).
    /// </summary>
    public static (Monomial[] Monomials, T[] Coefficients) AddScaledShifted(
        Monomial[] am, T[] ac, int aStart, Monomial[] bm, T[] bc, T factor, Monomial shift, MonomialOrder order)
    {
        var capacity = am.Length - aStart + bm.Length;
        var rm = new Monomial[capacity];
        var rc = new T[capacity];
        var count = 0;
        int i = aStart, j = 0;
        var unitFactor = factor.IsOne;
        var noShift = shift.IsOne;
        Monomial? current = j < bm.Length ? (noShift ? bm[0] : bm[0] * shift) : null;
        while (i < am.Length && current is not null)
        {
            var c = order.CompareCore(am[i], current);
            if (c > 0)
            {
                rm[count] = am[i];
                rc[count++] = ac[i++];
            }
            else if (c < 0)
            {
                rm[count] = current;
                rc[count++] = unitFactor ? bc[j] : factor * bc[j];
                j++;
                current = j < bm.Length ? (noShift ? bm[j] : bm[j] * shift) : null;
            }
            else
            {
                var sum = ac[i] + (unitFactor ? bc[j] : factor * bc[j]);
                if (!sum.IsZero)
                {
                    rm[count] = am[i];
                    rc[count++] = sum;
                }

                i++;
                j++;
                current = j < bm.Length ? (noShift ? bm[j] : bm[j] * shift) : null;
            }
        }

        while (i < am.Length)
        {
            rm[count] = am[i];
            rc[count++] = ac[i++];
        }

        while (current is not null)
        {
            rm[count] = current;
            rc[count++] = unitFactor ? bc[j] : factor * bc[j];
            j++;
            current = j < bm.Length ? (noShift ? bm[j] : bm[j] * shift) : null;
        }

        if (count < capacity)
        {
            Array.Resize(ref rm, count);
            Array.Resize(ref rc, count);
        }

        return (rm, rc);
    }

    /// <summary>The product of two sorted term arrays.</summary>
    public static (Monomial[] Monomials, T[] Coefficients) Multiply(Monomial[] am, T[] ac, Monomial[] bm, T[] bc, MonomialOrder order)
    {
        if (am.Length == 0 || bm.Length == 0)
        {
            return ([], []);
        }

        if (am.Length < bm.Length)
        {
            (am, ac, bm, bc) = (bm, bc, am, ac);
        }

        if (bm.Length == 1)
        {
            return AddScaledShifted([], [], 0, am, ac, bc[0], bm[0], order);
        }

        var sums = new Dictionary<Monomial, T>(am.Length * bm.Length);
        for (var i = 0; i < am.Length; i++)
        {
            for (var j = 0; j < bm.Length; j++)
            {
                var m = am[i] * bm[j];
                var c = ac[i] * bc[j];
                sums[m] = sums.TryGetValue(m, out var old) ? old + c : c;
            }
        }

        return FromUnsorted(sums, order);
    }

    /// <summary>Sorts collected terms and drops zero coefficients.</summary>
    public static (Monomial[] Monomials, T[] Coefficients) FromUnsorted(IEnumerable<KeyValuePair<Monomial, T>> terms, MonomialOrder order)
    {
        var monomials = new List<Monomial>();
        var coefficients = new List<T>();
        foreach (var (m, c) in terms)
        {
            if (!c.IsZero)
            {
                monomials.Add(m);
                coefficients.Add(c);
            }
        }

        var rm = monomials.ToArray();
        var rc = coefficients.ToArray();
        Array.Sort(rm, rc, order.Descending);
        return (rm, rc);
    }

    /// <summary>Re-sorts terms that are sorted under another order (no combining needed: monomials are distinct).</summary>
    public static (Monomial[] Monomials, T[] Coefficients) Resort(Monomial[] monomials, T[] coefficients, MonomialOrder order)
    {
        var rm = (Monomial[])monomials.Clone();
        var rc = (T[])coefficients.Clone();
        Array.Sort(rm, rc, order.Descending);
        return (rm, rc);
    }

    /// <summary>Every coefficient multiplied by a non-zero factor.</summary>
    public static T[] Scale(T[] coefficients, T factor)
    {
        var result = new T[coefficients.Length];
        for (var k = 0; k < result.Length; k++)
        {
            result[k] = coefficients[k] * factor;
        }

        return result;
    }
}
