using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// The textbook multivariate division algorithm on term arrays sorted descending under one order
/// (Cox, Little and O'Shea, Ideals, Varieties, and Algorithms, Section 2.3, Theorem 3): repeatedly cancel the
/// leading term of the running polynomial with the first divisor whose leading monomial divides it, otherwise move
/// that term to the remainder.
/// </summary>
internal static class Reduction<T>
    where T : IFieldElement<T>
{
    /// <summary>
    /// Divides (pm, pc) by the divisors. Returns the remainder sorted under <paramref name="order"/>; when
    /// <paramref name="quotients"/> is given, the quotient terms (in descending order) are appended to it per divisor.
    /// </summary>
    public static (Monomial[] Monomials, T[] Coefficients) Divide(
        Monomial[] pm,
        T[] pc,
        IReadOnlyList<(Monomial[] Monomials, T[] Coefficients)> divisors,
        MonomialOrder order,
        List<(Monomial Monomial, T Coefficient)>[]? quotients)
    {
        var leadInverse = new T[divisors.Count];
        for (var k = 0; k < divisors.Count; k++)
        {
            leadInverse[k] = divisors[k].Coefficients[0].IsOne ? T.One : divisors[k].Coefficients[0].Reciprocal();
        }

        var remainderMonomials = new List<Monomial>();
        var remainderCoefficients = new List<T>();
        var start = 0;
        while (start < pm.Length)
        {
            var lead = pm[start];
            var divided = false;
            for (var k = 0; k < divisors.Count; k++)
            {
                var (gm, gc) = divisors[k];
                if (!gm[0].Divides(lead))
                {
                    continue;
                }

                var shift = lead.DivideByUnchecked(gm[0]);
                var factor = leadInverse[k].IsOne ? pc[start] : pc[start] * leadInverse[k];
                quotients?[k].Add((shift, factor));

                // The leading terms cancel exactly, so both are skipped rather than subtracted.
                (pm, pc) = TermArithmetic<T>.AddScaledShifted(pm, pc, start + 1, gm[1..], gc[1..], -factor, shift, order);
                start = 0;
                divided = true;
                break;
            }

            if (!divided)
            {
                remainderMonomials.Add(lead);
                remainderCoefficients.Add(pc[start]);
                start++;
            }
        }

        return (remainderMonomials.ToArray(), remainderCoefficients.ToArray());
    }
}
