using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Polynomials;

public sealed partial class Polynomial<T>
{
    /// <summary>The sum; cost linear in the number of terms.</summary>
    public static Polynomial<T> operator +(Polynomial<T> left, Polynomial<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (left.IsZero)
        {
            return right;
        }

        if (right.IsZero)
        {
            return left;
        }

        return FromArrays(TermArithmetic<T>.AddScaledShifted(
            left._monomials, left._coefficients, 0, right._monomials, right._coefficients, T.One, Monomial.One, MonomialOrder.Default));
    }

    /// <summary>The difference.</summary>
    public static Polynomial<T> operator -(Polynomial<T> left, Polynomial<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (right.IsZero)
        {
            return left;
        }

        return FromArrays(TermArithmetic<T>.AddScaledShifted(
            left._monomials, left._coefficients, 0, right._monomials, right._coefficients, -T.One, Monomial.One, MonomialOrder.Default));
    }

    /// <summary>The negative.</summary>
    public static Polynomial<T> operator -(Polynomial<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.IsZero ? value : new Polynomial<T>(value._monomials, TermArithmetic<T>.Scale(value._coefficients, -T.One));
    }

    /// <summary>The product; cost proportional to the product of the term counts.</summary>
    public static Polynomial<T> operator *(Polynomial<T> left, Polynomial<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        return FromArrays(TermArithmetic<T>.Multiply(
            left._monomials, left._coefficients, right._monomials, right._coefficients, MonomialOrder.Default));
    }

    /// <summary>The polynomial multiplied by a scalar.</summary>
    public static Polynomial<T> operator *(T factor, Polynomial<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.MultiplyByScalar(factor);
    }

    /// <summary>The polynomial multiplied by a scalar.</summary>
    public static Polynomial<T> operator *(Polynomial<T> value, T factor)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.MultiplyByScalar(factor);
    }

    /// <summary>The polynomial divided by a non-zero scalar.</summary>
    /// <exception cref="DivideByZeroException">The divisor is zero.</exception>
    public static Polynomial<T> operator /(Polynomial<T> value, T divisor)
    {
        ArgumentNullException.ThrowIfNull(value);
        if (divisor.IsZero)
        {
            throw new DivideByZeroException($"Cannot divide the polynomial {value} by the scalar 0.");
        }

        return value.MultiplyByScalar(divisor.Reciprocal());
    }

    /// <inheritdoc />
    public Polynomial<T> Scale(Rational factor) => MultiplyByScalar(T.FromRational(factor));

    /// <summary>The polynomial multiplied by the monomial <paramref name="monomial"/> times <paramref name="coefficient"/>.</summary>
    public Polynomial<T> MultiplyByTerm(T coefficient, Monomial monomial)
    {
        ArgumentNullException.ThrowIfNull(monomial);
        if (coefficient.IsZero || IsZero)
        {
            return ZeroInstance;
        }

        return FromArrays(TermArithmetic<T>.AddScaledShifted([], [], 0, _monomials, _coefficients, coefficient, monomial, MonomialOrder.Default));
    }

    /// <summary>
    /// The polynomial with every coefficient conjugated; variables are treated as real (so conj(i*x) = -i*x).
    /// For real coefficient fields this is the polynomial itself.
    /// </summary>
    public Polynomial<T> Conjugate()
    {
        var changed = false;
        var conjugated = new T[_coefficients.Length];
        for (var k = 0; k < conjugated.Length; k++)
        {
            conjugated[k] = _coefficients[k].Conjugate();
            changed |= !conjugated[k].Equals(_coefficients[k]);
        }

        return changed ? new Polynomial<T>(_monomials, conjugated) : this;
    }

    /// <summary>
    /// The polynomial to a non-negative integer power (by repeated squaring; p^0 = 1, including 0^0), refused before any
    /// work when the result is estimated to exceed <see cref="PowerLimits.Default"/>.
    /// </summary>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    /// <exception cref="BeyondCapabilityException">The estimated result exceeds the default limits, or an exponent or
    /// the total degree of the result would exceed <see cref="int.MaxValue"/>.</exception>
    public Polynomial<T> Pow(int exponent) => Pow(exponent, PowerLimits.Default);

    /// <summary>
    /// The polynomial to a non-negative integer power, refused before any work when the result's estimated size exceeds
    /// <paramref name="limits"/>. For several terms: the number of terms is at most the number of multisets of size
    /// <paramref name="exponent"/> drawn from the polynomial's terms, and at most the number of monomials of the result's
    /// total degree or less; the largest coefficient is estimated at <paramref name="exponent"/> x (b - b1 + log2 k) bits,
    /// b the bits of the largest coefficient (numerator and denominator together), b1 those of the coefficient 1 and
    /// k the number of terms. A single term is raised directly (one scalar power) without the degree and term limits,
    /// but its coefficient estimate <paramref name="exponent"/> x (b - b1) bits is held to
    /// <see cref="PowerLimits.MaxCoefficientBits"/>; p^1 is p itself, whatever its size.
    /// </summary>
    /// <exception cref="ExactArgumentException">The exponent is negative, or <paramref name="limits"/> is invalid.</exception>
    /// <exception cref="BeyondCapabilityException">The estimated result exceeds <paramref name="limits"/>, or an exponent
    /// or the total degree of the result would exceed <see cref="int.MaxValue"/> (whatever the limits); the message
    /// gives the estimate.</exception>
    public Polynomial<T> Pow(int exponent, PowerLimits limits)
    {
        ArgumentNullException.ThrowIfNull(limits);
        limits.Validate();
        if (exponent < 0)
        {
            throw new ExactArgumentException(
                $"Exponent {exponent} is negative; polynomials have only non-negative integer powers (polynomial {this}).", nameof(exponent));
        }

        if (exponent == 0)
        {
            return OneInstance;
        }

        if (exponent == 1 || IsZero)
        {
            return this;
        }

        CheckPowerEstimate(exponent, limits);
        if (_monomials.Length == 1)
        {
            return new Polynomial<T>([_monomials[0].Pow(exponent)], [PowScalar(_coefficients[0], exponent)]);
        }

        return Powers.BySquaring(OneInstance, this, exponent);
    }

    private void CheckPowerEstimate(int exponent, PowerLimits limits)
    {
        var degree = (long)TotalDegree * exponent;
        var single = _monomials.Length == 1;
        if (!single)
        {
            // Terms of p^e: multisets of e terms of p, C(k - 1 + e, e), and monomials in n variables of degree <= d e, C(n + d e, n).
            var byTerms = Binomial(_monomials.Length - 1 + (long)exponent, _monomials.Length - 1);
            var byMonomials = Binomial(Symbols.Count + degree, Symbols.Count);
            var terms = BigInteger.Min(byTerms, byMonomials);
            if (degree > limits.MaxTotalDegree || terms > limits.MaxTerms)
            {
                throw new BeyondCapabilityException(
                    $"({Shown()})^{exponent} would have total degree {degree} and up to {(terms > BigInteger.Pow(10, 15) ? "about 10^" + (int)BigInteger.Log10(terms) : terms.ToString("N0", System.Globalization.CultureInfo.InvariantCulture))} terms, " +
                    $"beyond the limits ({limits}). Pass a larger PowerLimits to Pow(exponent, limits) to go on.");
            }
        }

        // Coefficient growth per factor: the bits beyond those of 1 (so powers of x, -x or i x cost nothing), plus
        // log2 k for the multinomial coefficients (at most k^e) when there are k > 1 terms.
        var extraBits = Math.Max(0, CoefficientSupport<T>.LargestBits(_coefficients) - CoefficientSupport<T>.OneBits);
        var bits = exponent * (extraBits + (single ? 0 : Math.Log2(_monomials.Length)));
        if (bits > limits.MaxCoefficientBits)
        {
            throw new BeyondCapabilityException(
                $"({Shown()})^{exponent} would have coefficients of about {bits.ToString("G4", System.Globalization.CultureInfo.InvariantCulture)} bits, " +
                $"beyond the limits ({limits}). Pass a larger PowerLimits to Pow(exponent, limits) to go on.");
        }

        CheckDegreeFits(exponent, degree);
    }

    private void CheckDegreeFits(int exponent, long degree)
    {
        // Exponents and total degrees are ints (see Monomial); refused whatever the limits, never wrapped around.
        if (degree > int.MaxValue)
        {
            throw new BeyondCapabilityException(
                $"({Shown()})^{exponent} would have total degree {degree}, beyond the largest exponent and total degree a monomial holds ({int.MaxValue}).");
        }
    }

    private string Shown()
    {
        var shown = ToString();
        return shown.Length > 60 ? shown[..57] + "..." : shown;
    }

    private static BigInteger Binomial(long n, long k)
    {
        // Stops early once the value is far beyond any limit, so huge exponents cost nothing.
        k = Math.Min(k, n - k);
        var result = BigInteger.One;
        var cap = BigInteger.Pow(10, 40);
        for (long j = 1; j <= k; j++)
        {
            result = result * (n - k + j) / j;
            if (result > cap)
            {
                return result;
            }
        }

        return result;
    }

    private static T PowScalar(T value, int exponent)
    {
        var result = T.One;
        while (exponent > 0)
        {
            if ((exponent & 1) != 0)
            {
                result *= value;
            }

            exponent >>= 1;
            if (exponent > 0)
            {
                value *= value;
            }
        }

        return result;
    }

    private Polynomial<T> MultiplyByScalar(T factor)
    {
        if (factor.IsZero || IsZero)
        {
            return ZeroInstance;
        }

        return factor.IsOne ? this : new Polynomial<T>(_monomials, TermArithmetic<T>.Scale(_coefficients, factor));
    }
}
