using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Polynomials;

public sealed partial class Polynomial<T>
{
    /// <summary>
    /// Multivariate division with remainder (Cox, Little and O'Shea, Section 2.3): returns quotients q_k and a
    /// remainder r with <c>this = sum q_k * divisors[k] + r</c>, where no term of r is divisible by a leading monomial
    /// of a divisor under <paramref name="order"/> (default <see cref="MonomialOrder.Default"/>). The result depends on
    /// the order of the divisors unless they form a Groebner basis.
    /// </summary>
    /// <exception cref="ExactArgumentException">A divisor is zero.</exception>
    public (IReadOnlyList<Polynomial<T>> Quotients, Polynomial<T> Remainder) DivideWithRemainder(
        IReadOnlyList<Polynomial<T>> divisors, MonomialOrder? order = null)
    {
        ArgumentNullException.ThrowIfNull(divisors);
        order ??= MonomialOrder.Default;
        var sorted = new (Monomial[], T[])[divisors.Count];
        for (var k = 0; k < divisors.Count; k++)
        {
            var d = divisors[k] ?? throw new ArgumentNullException(nameof(divisors), $"Divisor {k} is null.");
            if (d.IsZero)
            {
                throw new ExactArgumentException($"Cannot divide {this} by the divisor list: divisor {k} is the zero polynomial.", nameof(divisors));
            }

            sorted[k] = d.SortedBy(order);
        }

        var quotientTerms = new List<(Monomial Monomial, T Coefficient)>[divisors.Count];
        for (var k = 0; k < quotientTerms.Length; k++)
        {
            quotientTerms[k] = [];
        }

        var (pm, pc) = SortedBy(order);
        var (rm, rc) = Reduction<T>.Divide(pm, pc, sorted, order, quotientTerms);
        var quotients = new Polynomial<T>[divisors.Count];
        for (var k = 0; k < quotients.Length; k++)
        {
            quotients[k] = FromOrderedArrays(
                quotientTerms[k].Select(t => t.Monomial).ToArray(), quotientTerms[k].Select(t => t.Coefficient).ToArray(), order);
        }

        return (quotients, FromOrderedArrays(rm, rc, order));
    }

    /// <summary>
    /// Exact division: true with <paramref name="quotient"/> when <paramref name="dividend"/> = quotient *
    /// <paramref name="divisor"/>; false when the division leaves a remainder or the divisor is zero.
    /// </summary>
    public static bool TryDivideExact(Polynomial<T> dividend, Polynomial<T> divisor, out Polynomial<T> quotient)
    {
        ArgumentNullException.ThrowIfNull(dividend);
        ArgumentNullException.ThrowIfNull(divisor);
        quotient = ZeroInstance;
        if (divisor.IsZero)
        {
            return false;
        }

        // A single non-zero polynomial is a Groebner basis of the ideal it generates, so the remainder is zero
        // exactly when the divisor divides.
        var (quotients, remainder) = dividend.DivideWithRemainder([divisor]);
        if (!remainder.IsZero)
        {
            return false;
        }

        quotient = quotients[0];
        return true;
    }

    /// <summary>
    /// The polynomial divided by its leading coefficient under <paramref name="order"/> (default
    /// <see cref="MonomialOrder.Default"/>), so that the leading coefficient is 1. Zero stays zero.
    /// </summary>
    public Polynomial<T> Monic(MonomialOrder? order = null)
    {
        if (IsZero)
        {
            return this;
        }

        var lead = LeadingCoefficient(order);
        return lead.IsOne ? this : MultiplyByScalar(lead.Reciprocal());
    }

    /// <summary>
    /// The content: the positive rational c such that this / c has integer coefficients (Gaussian integers for
    /// GaussianRational) whose rational components have greatest common divisor 1. Zero for the zero polynomial.
    /// For other coefficient fields the content is 1.
    /// </summary>
    public T Content()
    {
        if (IsZero)
        {
            return T.Zero;
        }

        var numeratorGcd = BigInteger.Zero;
        var denominatorLcm = BigInteger.One;
        foreach (var c in _coefficients)
        {
            var parts = CoefficientSupport<T>.RationalParts(c);
            if (parts is null)
            {
                return T.One;
            }

            foreach (var part in parts)
            {
                if (part.IsZero)
                {
                    continue;
                }

                numeratorGcd = BigInteger.GreatestCommonDivisor(numeratorGcd, part.Numerator);
                denominatorLcm = denominatorLcm / BigInteger.GreatestCommonDivisor(denominatorLcm, part.Denominator) * part.Denominator;
            }
        }

        return T.FromRational(new Rational(numeratorGcd, denominatorLcm));
    }

    /// <summary>
    /// The primitive part: this divided by <see cref="Content"/>, with the sign chosen so that the leading coefficient
    /// (in <see cref="MonomialOrder.Default"/>) has a positive first non-zero rational component (real part, else
    /// imaginary part). Zero stays zero.
    /// </summary>
    public Polynomial<T> PrimitivePart()
    {
        if (IsZero)
        {
            return this;
        }

        var content = Content();
        var parts = CoefficientSupport<T>.RationalParts(_coefficients[0]);
        var negative = parts is not null && parts.First(p => !p.IsZero).Sign < 0;
        var factor = content.Reciprocal();
        return MultiplyByScalar(negative ? -factor : factor);
    }

    internal (Monomial[] Monomials, T[] Coefficients) SortedBy(MonomialOrder order) =>
        ReferenceEquals(order, MonomialOrder.Default)
            ? (_monomials, _coefficients)
            : TermArithmetic<T>.Resort(_monomials, _coefficients, order);
}
