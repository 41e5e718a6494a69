using System.Numerics;

namespace AlgebraNotebook.Exact.Scalars;

/// <summary>
/// An exact rational number on <see cref="BigInteger"/>. Always canonical: numerator and denominator are coprime,
/// the denominator is positive, and <c>default(Rational)</c> is 0. Division by zero throws <see cref="DivideByZeroException"/>.
/// </summary>
/// <example><c>Rational.Parse("3/4") + new Rational(1, 4) == Rational.One</c></example>
public readonly partial struct Rational :
    IFieldElement<Rational>,
    IExactDivision<Rational>,
    IComparable<Rational>,
    IComparisonOperators<Rational, Rational, bool>
{
    private readonly BigInteger _numerator;

    // Stored as denominator - 1 so that default(Rational) is the canonical 0/1.
    private readonly BigInteger _denominatorMinusOne;

    private Rational(BigInteger numerator, BigInteger denominator, bool alreadyCanonical)
    {
        _ = alreadyCanonical;
        _numerator = numerator;
        _denominatorMinusOne = denominator - BigInteger.One;
    }

    /// <summary>Creates the canonical form of <paramref name="numerator"/>/<paramref name="denominator"/>.</summary>
    /// <exception cref="DivideByZeroException">The denominator is zero.</exception>
    public Rational(BigInteger numerator, BigInteger denominator)
    {
        if (denominator.IsZero)
        {
            throw new DivideByZeroException($"Rational {numerator}/0: the denominator is zero.");
        }

        if (denominator.Sign < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        var g = BigInteger.GreatestCommonDivisor(numerator, denominator);
        if (!g.IsOne && !g.IsZero)
        {
            numerator /= g;
            denominator /= g;
        }

        if (numerator.IsZero)
        {
            denominator = BigInteger.One;
        }

        _numerator = numerator;
        _denominatorMinusOne = denominator - BigInteger.One;
    }

    /// <summary>Creates an integer-valued rational.</summary>
    public Rational(BigInteger value)
    {
        _numerator = value;
        _denominatorMinusOne = BigInteger.Zero;
    }

    /// <summary>The numerator (carries the sign).</summary>
    public BigInteger Numerator => _numerator;

    /// <summary>The denominator, always positive.</summary>
    public BigInteger Denominator => _denominatorMinusOne + BigInteger.One;

    /// <inheritdoc />
    public static Rational Zero => default;

    /// <inheritdoc />
    public static Rational One => new(BigInteger.One);

    /// <summary>Minus one.</summary>
    public static Rational MinusOne => new(BigInteger.MinusOne);

    /// <summary>One half.</summary>
    public static Rational Half => new(BigInteger.One, new BigInteger(2), alreadyCanonical: true);

    /// <inheritdoc />
    public bool IsZero => _numerator.IsZero;

    /// <inheritdoc />
    public bool IsOne => _numerator.IsOne && _denominatorMinusOne.IsZero;

    /// <summary>True when the denominator is 1.</summary>
    public bool IsInteger => _denominatorMinusOne.IsZero;

    /// <summary>-1, 0 or 1.</summary>
    public int Sign => _numerator.Sign;

    /// <inheritdoc />
    public static Rational FromInteger(BigInteger value) => new(value);

    /// <inheritdoc />
    public static Rational FromRational(Rational value) => value;

    /// <inheritdoc />
    public Rational Scale(Rational factor) => this * factor;

    /// <inheritdoc />
    public Rational Conjugate() => this;

    /// <summary>Builds a rational from numerator and denominator that the caller guarantees canonical.</summary>
    internal static Rational FromCanonical(BigInteger numerator, BigInteger denominator) => new(numerator, denominator, alreadyCanonical: true);

    /// <summary>
    /// Builds a rational from a numerator and denominator - 1 (the stored form) that the caller guarantees canonical, so
    /// that many rationals can share one stored denominator.
    /// </summary>
    internal static Rational FromCanonicalStored(BigInteger numerator, BigInteger denominatorMinusOne) => new(numerator, denominatorMinusOne, stored: 0);

    // The stored form as given (see FromCanonicalStored).
    private Rational(BigInteger numerator, BigInteger denominatorMinusOne, byte stored)
    {
        _ = stored;
        _numerator = numerator;
        _denominatorMinusOne = denominatorMinusOne;
    }

    /// <summary>Implicit conversion from <see cref="int"/>.</summary>
    public static implicit operator Rational(int value) => new(new BigInteger(value));

    /// <summary>Implicit conversion from <see cref="long"/>.</summary>
    public static implicit operator Rational(long value) => new(new BigInteger(value));

    /// <summary>Implicit conversion from <see cref="BigInteger"/>.</summary>
    public static implicit operator Rational(BigInteger value) => new(value);

    /// <inheritdoc />
    public bool Equals(Rational other) => _numerator.Equals(other._numerator) && _denominatorMinusOne.Equals(other._denominatorMinusOne);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Rational other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => HashCode.Combine(_numerator, _denominatorMinusOne);

    /// <inheritdoc />
    public int CompareTo(Rational other)
    {
        if (_denominatorMinusOne.Equals(other._denominatorMinusOne))
        {
            return _numerator.CompareTo(other._numerator);
        }

        return (_numerator * other.Denominator).CompareTo(other._numerator * Denominator);
    }

    /// <inheritdoc />
    public static bool operator ==(Rational left, Rational right) => left.Equals(right);

    /// <inheritdoc />
    public static bool operator !=(Rational left, Rational right) => !left.Equals(right);

    /// <inheritdoc />
    public static bool operator <(Rational left, Rational right) => left.CompareTo(right) < 0;

    /// <inheritdoc />
    public static bool operator >(Rational left, Rational right) => left.CompareTo(right) > 0;

    /// <inheritdoc />
    public static bool operator <=(Rational left, Rational right) => left.CompareTo(right) <= 0;

    /// <inheritdoc />
    public static bool operator >=(Rational left, Rational right) => left.CompareTo(right) >= 0;

    /// <summary>Plain text: "3/4", "-2", "0".</summary>
    public override string ToString() => IsInteger ? _numerator.ToString() : $"{_numerator}/{Denominator}";
}
