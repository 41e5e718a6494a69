using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>An element a + b i of Z[i], used to enumerate divisors when searching for Gaussian-rational roots.</summary>
internal readonly record struct GaussianInteger(BigInteger Real, BigInteger Imaginary)
{
    public static readonly GaussianInteger One = new(BigInteger.One, BigInteger.Zero);

    public static readonly GaussianInteger[] Units =
    [
        new(BigInteger.One, BigInteger.Zero),
        new(BigInteger.Zero, BigInteger.One),
        new(BigInteger.MinusOne, BigInteger.Zero),
        new(BigInteger.Zero, BigInteger.MinusOne),
    ];

    public bool IsZero => Real.IsZero && Imaginary.IsZero;

    public BigInteger Norm => Real * Real + Imaginary * Imaginary;

    public GaussianInteger Conjugate() => new(Real, -Imaginary);

    public static GaussianInteger operator *(GaussianInteger a, GaussianInteger b) =>
        new(a.Real * b.Real - a.Imaginary * b.Imaginary, a.Real * b.Imaginary + a.Imaginary * b.Real);

    public static GaussianInteger operator -(GaussianInteger a, GaussianInteger b) => new(a.Real - b.Real, a.Imaginary - b.Imaginary);

    public GaussianRational ToGaussianRational() => new(Real, Imaginary);

    /// <summary>Exact division in Z[i]; false when the divisor does not divide.</summary>
    public static bool TryDivide(GaussianInteger dividend, GaussianInteger divisor, out GaussianInteger quotient)
    {
        var norm = divisor.Norm;
        var product = dividend * divisor.Conjugate();
        var re = BigInteger.DivRem(product.Real, norm, out var reRemainder);
        var im = BigInteger.DivRem(product.Imaginary, norm, out var imRemainder);
        quotient = new GaussianInteger(re, im);
        return reRemainder.IsZero && imRemainder.IsZero;
    }

    /// <summary>The Euclidean remainder with the quotient rounded to the nearest Gaussian integer (norm decreases).</summary>
    public static GaussianInteger Remainder(GaussianInteger dividend, GaussianInteger divisor)
    {
        var norm = divisor.Norm;
        var product = dividend * divisor.Conjugate();
        var q = new GaussianInteger(RoundDivide(product.Real, norm), RoundDivide(product.Imaginary, norm));
        return dividend - q * divisor;
    }

    /// <summary>A greatest common divisor (defined up to a unit).</summary>
    public static GaussianInteger Gcd(GaussianInteger a, GaussianInteger b)
    {
        while (!b.IsZero)
        {
            (a, b) = (b, Remainder(a, b));
        }

        return a;
    }

    /// <summary>
    /// A Gaussian prime of norm p for a rational prime p = 1 (mod 4): gcd(p, t + i) with t^2 = -1 (mod p).
    /// </summary>
    public static GaussianInteger PrimeAbove(BigInteger p)
    {
        var exponent = (p - 1) / 4;
        for (BigInteger c = 2; c < p; c++)
        {
            var t = BigInteger.ModPow(c, exponent, p);
            if ((t * t + 1) % p == 0)
            {
                return Gcd(new GaussianInteger(p, BigInteger.Zero), new GaussianInteger(t, BigInteger.One));
            }
        }

        throw new InvalidOperationException($"{p} is not a prime congruent to 1 modulo 4.");
    }

    private static BigInteger RoundDivide(BigInteger numerator, BigInteger positiveDenominator)
    {
        // floor((2 x + n) / (2 n))
        var twice = 2 * numerator + positiveDenominator;
        var denominator = 2 * positiveDenominator;
        var q = BigInteger.DivRem(twice, denominator, out var r);
        return r.Sign < 0 ? q - 1 : q;
    }
}
