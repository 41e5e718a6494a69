using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Internal;

/// <summary>
/// Arithmetic modulo the Mersenne prime p = 2^61 - 1 on ulong residues in [0, p), with rational reconstruction.
/// Used only to find candidates quickly; every candidate is checked exactly over the rationals before it is used.
/// </summary>
internal static class PrimeField
{
    public const ulong P = (1UL << 61) - 1;

    /// <summary>Numerators and denominators up to this bound (about 1.07e9, below sqrt(p/2)) are reconstructed uniquely.</summary>
    public const long ReconstructionBound = 1_073_741_823;

    public static ulong Add(ulong a, ulong b)
    {
        var s = a + b;
        return s >= P ? s - P : s;
    }

    public static ulong Sub(ulong a, ulong b) => a >= b ? a - b : a + P - b;

    public static ulong Neg(ulong a) => a == 0 ? 0 : P - a;

    public static ulong Mul(ulong a, ulong b)
    {
        // a b < 2^122 = hi 2^64 + lo; 2^61 = 1 (mod p), so a b = (low 61 bits) + (the rest shifted down by 61).
        var hi = Math.BigMul(a, b, out var lo);
        var s = (lo & P) + ((lo >> 61) | (hi << 3));
        return s >= P ? s - P : s;
    }

    public static ulong Pow(ulong a, ulong e)
    {
        var result = 1UL;
        while (e > 0)
        {
            if ((e & 1) != 0)
            {
                result = Mul(result, a);
            }

            a = Mul(a, a);
            e >>= 1;
        }

        return result;
    }

    public static ulong Inverse(ulong a)
    {
        if (a == 0)
        {
            throw new DivideByZeroException("Inverse of 0 modulo 2^61 - 1.");
        }

        return Pow(a, P - 2);
    }

    public static ulong FromBig(BigInteger value)
    {
        if (value >= long.MinValue && value <= long.MaxValue)
        {
            var small = (long)value;
            var residue = (ulong)Math.Abs(small % (long)P);
            return small < 0 ? Neg(residue) : residue;
        }

        var r = (ulong)BigInteger.Remainder(BigInteger.Abs(value), P);
        return value.Sign < 0 ? Neg(r) : r;
    }

    /// <summary>The residue of a rational, or null when p divides its denominator.</summary>
    public static ulong? FromRational(Rational q)
    {
        if (q.IsInteger)
        {
            return FromBig(q.Numerator);
        }

        var d = FromBig(q.Denominator);
        return d == 0 ? null : Mul(FromBig(q.Numerator), Inverse(d));
    }

    /// <summary>
    /// The rational a/b with |a|, b at most <see cref="ReconstructionBound"/> and a = b u (mod p), or null when there is
    /// none (extended Euclid stopped at the bound; the classical rational reconstruction, from memory).
    /// </summary>
    public static Rational? Reconstruct(ulong u)
    {
        long r0 = (long)P, r1 = (long)u;
        long t0 = 0, t1 = 1;
        while (r1 > ReconstructionBound)
        {
            var q = r0 / r1;
            (r0, r1) = (r1, r0 - q * r1);
            (t0, t1) = (t1, t0 - q * t1);
        }

        if (t1 == 0 || Math.Abs(t1) > ReconstructionBound)
        {
            return null;
        }

        var result = new Rational(r1, t1);
        return FromRational(result) == u ? result : null;
    }
}
