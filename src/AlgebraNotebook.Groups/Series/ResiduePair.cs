using System.Numerics;
using System.Runtime.CompilerServices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// Two primes below 2^62 with their Montgomery constants -p^-1 mod 2^64, fixed at compile time so that the
/// arithmetic of <see cref="ResiduePair{TPrimes}"/> sees constants.
/// </summary>
internal interface IPrimePair
{
    /// <summary>The first prime.</summary>
    static abstract ulong P0 { get; }

    /// <summary>-P0^-1 modulo 2^64.</summary>
    static abstract ulong NegativeInverse0 { get; }

    /// <summary>The second prime.</summary>
    static abstract ulong P1 { get; }

    /// <summary>-P1^-1 modulo 2^64.</summary>
    static abstract ulong NegativeInverse1 { get; }
}

/// <summary>The primes 2^62 - 57 and 2^62 - 87.</summary>
internal readonly struct FirstPrimePair : IPrimePair
{
    public static ulong P0 => 4611686018427387847;

    public static ulong NegativeInverse0 => 13996871599788387849;

    public static ulong P1 => 4611686018427387817;

    public static ulong NegativeInverse1 => 12032789956126632807;
}

/// <summary>The primes 2^62 - 117 and 2^62 - 143 (with <see cref="FirstPrimePair"/> when 123 bits are too few).</summary>
internal readonly struct SecondPrimePair : IPrimePair
{
    public static ulong P0 => 4611686018427387787;

    public static ulong NegativeInverse0 => 1143067474652942301;

    public static ulong P1 => 4611686018427387761;

    public static ulong NegativeInverse1 => 3450702125676437103;
}

/// <summary>
/// A rational modulo the two primes of <typeparamref name="TPrimes"/>, each residue r held in Montgomery form
/// r 2^64 mod p, so that a multiply-add costs three 64-bit multiplications per prime and no division.
/// </summary>
internal readonly struct ResiduePair<TPrimes> : IPassArithmetic<ResiduePair<TPrimes>>
    where TPrimes : struct, IPrimePair
{
    private readonly ulong _m0;
    private readonly ulong _m1;

    private ResiduePair(ulong m0, ulong m1)
    {
        _m0 = m0;
        _m1 = m1;
    }

    /// <summary>The two primes, in order.</summary>
    public static ulong[] Primes => [TPrimes.P0, TPrimes.P1];

    public static ResiduePair<TPrimes> Zero => default;

    public bool IsZero => (_m0 | _m1) == 0;

    /// <summary>The residues (not in Montgomery form), in the order of <see cref="Primes"/>.</summary>
    public ulong this[int lane] => lane == 0
        ? MultiplyAdd(0, _m0, 1, TPrimes.P0, TPrimes.NegativeInverse0)
        : MultiplyAdd(0, _m1, 1, TPrimes.P1, TPrimes.NegativeInverse1);

    public static ResiduePair<TPrimes> FromRational(Rational value) =>
        new(ToMontgomery(value, TPrimes.P0), ToMontgomery(value, TPrimes.P1));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ResiduePair<TPrimes> Add(ResiduePair<TPrimes> a, ResiduePair<TPrimes> b) =>
        new(AddMod(a._m0, b._m0, TPrimes.P0), AddMod(a._m1, b._m1, TPrimes.P1));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ResiduePair<TPrimes> Multiply(ResiduePair<TPrimes> a, ResiduePair<TPrimes> b) =>
        new(
            MultiplyAdd(0, a._m0, b._m0, TPrimes.P0, TPrimes.NegativeInverse0),
            MultiplyAdd(0, a._m1, b._m1, TPrimes.P1, TPrimes.NegativeInverse1));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ResiduePair<TPrimes> MultiplyAdd(ResiduePair<TPrimes> sum, ResiduePair<TPrimes> a, ResiduePair<TPrimes> b) =>
        new(
            MultiplyAdd(sum._m0, a._m0, b._m0, TPrimes.P0, TPrimes.NegativeInverse0),
            MultiplyAdd(sum._m1, a._m1, b._m1, TPrimes.P1, TPrimes.NegativeInverse1));

    // sum + a b 2^-64 mod p for a, b, sum below p < 2^62 (Montgomery's reduction: a b + m p is divisible by 2^64 for
    // m = (a b mod 2^64) (-p^-1) mod 2^64, and (a b + m p) / 2^64 is below 2p).
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong MultiplyAdd(ulong sum, ulong a, ulong b, ulong p, ulong negativeInverse)
    {
        var high = Math.BigMul(a, b, out var low);
        var m = low * negativeInverse;
        var mHigh = Math.BigMul(m, p, out _);
        var t = high + mHigh + (low != 0 ? 1UL : 0UL) + sum;
        t = t >= p ? t - p : t;
        return t >= p ? t - p : t;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong AddMod(ulong a, ulong b, ulong p)
    {
        var s = a + b;
        return s >= p ? s - p : s;
    }

    // (numerator / denominator) 2^64 modulo p; the pass's constants have denominators with only small prime factors.
    private static ulong ToMontgomery(Rational value, ulong p)
    {
        var modulus = new BigInteger(p);
        var numerator = ((value.Numerator % modulus) + modulus) % modulus;
        var denominator = value.Denominator % modulus;
        if (denominator.IsZero)
        {
            throw new InvalidOperationException($"The constant {value} has a denominator divisible by the prime {p}.");
        }

        var residue = numerator * BigInteger.ModPow(denominator, modulus - 2, modulus) % modulus;
        return (ulong)((residue << 64) % modulus);
    }
}
