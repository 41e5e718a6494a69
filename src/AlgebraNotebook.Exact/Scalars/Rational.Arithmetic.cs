using System.Numerics;

namespace AlgebraNotebook.Exact.Scalars;

public readonly partial struct Rational
{
    /// <inheritdoc />
    public static Rational operator +(Rational left, Rational right)
    {
        if (left.IsZero)
        {
            return right;
        }

        if (right.IsZero)
        {
            return left;
        }

        if (left.IsInteger && right.IsInteger)
        {
            return new Rational(left._numerator + right._numerator);
        }

        // Henrici's trick: work with g = gcd(b, d) to keep intermediate numbers small.
        var b = left.Denominator;
        var d = right.Denominator;
        var g = BigInteger.GreatestCommonDivisor(b, d);
        if (g.IsOne)
        {
            return FromCanonical(left._numerator * d + right._numerator * b, b * d).Normalise();
        }

        var bg = b / g;
        var t = left._numerator * (d / g) + right._numerator * bg;
        if (t.IsZero)
        {
            return Zero;
        }

        var g2 = BigInteger.GreatestCommonDivisor(t, g);
        return FromCanonical(t / g2, bg * (d / g2));
    }

    /// <inheritdoc />
    public static Rational operator -(Rational left, Rational right) => left + (-right);

    /// <inheritdoc />
    public static Rational operator -(Rational value) => FromCanonical(-value._numerator, value.Denominator);

    /// <inheritdoc />
    public static Rational operator *(Rational left, Rational right)
    {
        if (left.IsZero || right.IsZero)
        {
            return Zero;
        }

        if (left.IsInteger && right.IsInteger)
        {
            return new Rational(left._numerator * right._numerator);
        }

        // Cross-cancel before multiplying (operands are already reduced).
        var g1 = BigInteger.GreatestCommonDivisor(left._numerator, right.Denominator);
        var g2 = BigInteger.GreatestCommonDivisor(right._numerator, left.Denominator);
        return FromCanonical(
            (left._numerator / g1) * (right._numerator / g2),
            (left.Denominator / g2) * (right.Denominator / g1));
    }

    /// <inheritdoc />
    public static Rational operator /(Rational left, Rational right)
    {
        if (right.IsZero)
        {
            throw new DivideByZeroException($"Division of {left} by zero.");
        }

        return left * right.Reciprocal();
    }

    /// <inheritdoc />
    public Rational Reciprocal()
    {
        if (IsZero)
        {
            throw new DivideByZeroException("The reciprocal of 0 does not exist.");
        }

        return _numerator.Sign < 0
            ? FromCanonical(-Denominator, -_numerator)
            : FromCanonical(Denominator, _numerator);
    }

    /// <inheritdoc />
    public static bool TryDivideExact(Rational dividend, Rational divisor, out Rational quotient)
    {
        if (divisor.IsZero)
        {
            quotient = Zero;
            return false;
        }

        quotient = dividend / divisor;
        return true;
    }

    /// <summary>Absolute value.</summary>
    public Rational Abs() => _numerator.Sign < 0 ? -this : this;

    /// <summary>Integer power; negative exponents invert (and throw <see cref="DivideByZeroException"/> for zero).</summary>
    /// <exception cref="BeyondCapabilityException">The result has more bits than a .NET integer can hold.</exception>
    public Rational Pow(int exponent)
    {
        if (exponent < 0)
        {
            if (IsZero)
            {
                throw new DivideByZeroException($"0 cannot be raised to the negative power {exponent}.");
            }

            // -int.MinValue overflows back to int.MinValue, which would recurse forever.
            var reciprocal = Reciprocal();
            return exponent == int.MinValue ? reciprocal.Pow(int.MaxValue) * reciprocal : reciprocal.Pow(-exponent);
        }

        try
        {
            return FromCanonical(BigInteger.Pow(_numerator, exponent), BigInteger.Pow(Denominator, exponent));
        }
        catch (OverflowException e)
        {
            throw new BeyondCapabilityException(
                $"({this})^{exponent} is too large to hold exactly: it needs at least {((long)exponent * (Math.Max(_numerator.GetBitLength(), Denominator.GetBitLength()) - 1)) + 1} bits, beyond the largest integer .NET can store ({e.Message}).");
        }
    }

    /// <summary>The greatest integer not above this value.</summary>
    public BigInteger Floor()
    {
        var q = BigInteger.DivRem(_numerator, Denominator, out var r);
        return r.Sign < 0 ? q - BigInteger.One : q;
    }

    /// <summary>The least integer not below this value.</summary>
    public BigInteger Ceiling() => -(-this).Floor();

    /// <summary>
    /// The nearest double (ties to even), also for subnormal results. Converts by scaling, so huge numerators and
    /// denominators do not overflow to NaN; values beyond the double range give an infinity, values below half the
    /// smallest subnormal give 0.
    /// </summary>
    public double ToDouble()
    {
        if (IsZero)
        {
            return 0.0;
        }

        var n = BigInteger.Abs(_numerator);
        var d = Denominator;
        // Scale so that the integer quotient q = floor(n * 2^shift / d) has at least 54 bits, keep a sticky bit for the
        // remainder, and round once to 53 bits (fewer when the result is subnormal), so no double rounding occurs.
        var shift = 54 - ((long)n.GetBitLength() - (long)d.GetBitLength());
        var q = shift >= 0
            ? BigInteger.DivRem(n << (int)shift, d, out var remainder)
            : BigInteger.DivRem(n, d << (int)(-shift), out remainder);
        var extra = Math.Max((long)q.GetBitLength() - 53, -1074 + shift);
        BigInteger mantissa;
        if (extra > q.GetBitLength() + 1)
        {
            mantissa = BigInteger.Zero;
        }
        else
        {
            mantissa = q >> (int)extra;
            var dropped = q - (mantissa << (int)extra);
            var half = BigInteger.One << (int)(extra - 1);
            var comparison = dropped.CompareTo(half);
            if (comparison > 0 || (comparison == 0 && (!remainder.IsZero || !mantissa.IsEven)))
            {
                mantissa += BigInteger.One;
            }
        }

        var exponent = extra - shift;
        var value = exponent > 2000 ? double.PositiveInfinity : Math.ScaleB((double)mantissa, (int)exponent);
        return _numerator.Sign < 0 ? -value : value;
    }

    /// <summary>Explicit conversion to double (approximate), see <see cref="ToDouble"/>.</summary>
    public static explicit operator double(Rational value) => value.ToDouble();

    private Rational Normalise() => new(_numerator, Denominator);
}
