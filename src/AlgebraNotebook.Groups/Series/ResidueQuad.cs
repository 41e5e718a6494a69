using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Series;

/// <summary>Four primes below 2^26, fixed at compile time.</summary>
internal interface IPrimeQuad
{
    /// <summary>The first prime.</summary>
    static abstract int P0 { get; }

    /// <summary>The second prime.</summary>
    static abstract int P1 { get; }

    /// <summary>The third prime.</summary>
    static abstract int P2 { get; }

    /// <summary>The fourth prime.</summary>
    static abstract int P3 { get; }
}

/// <summary>The primes 2^26 - 5, 2^26 - 27, 2^26 - 45 and 2^26 - 87.</summary>
internal readonly struct FirstPrimeQuad : IPrimeQuad
{
    public static int P0 => 67108859;

    public static int P1 => 67108837;

    public static int P2 => 67108819;

    public static int P3 => 67108777;
}

/// <summary>The primes 2^26 - 101, 2^26 - 107, 2^26 - 111 and 2^26 - 117 (with <see cref="FirstPrimeQuad"/> when 103 bits are too few).</summary>
internal readonly struct SecondPrimeQuad : IPrimeQuad
{
    public static int P0 => 67108763;

    public static int P1 => 67108757;

    public static int P2 => 67108753;

    public static int P3 => 67108747;
}

/// <summary>
/// A rational modulo the four primes of <typeparamref name="TPrimes"/>, as residues in [0, p) held in 32-bit lanes.
/// With AVX the four lanes are computed at once in double precision: a b + s is below 2^53, so it is exact, and
/// q = floor((a b + s) / p) from a rounded reciprocal is off by at most one, which the remainder's sign and size
/// reveal and fix. Without AVX each lane is computed in 64-bit integers.
/// </summary>
internal readonly struct ResidueQuad<TPrimes> : IPassArithmetic<ResidueQuad<TPrimes>>
    where TPrimes : struct, IPrimeQuad
{
    private static readonly Vector256<double> Modulus = Vector256.Create(TPrimes.P0, TPrimes.P1, TPrimes.P2, (double)TPrimes.P3);

    private static readonly Vector256<double> Reciprocal = Vector256<double>.One / Modulus;

    private readonly Vector128<int> _residues;

    private ResidueQuad(Vector128<int> residues) => _residues = residues;

    /// <summary>The four primes, in order.</summary>
    public static ulong[] Primes => [(ulong)TPrimes.P0, (ulong)TPrimes.P1, (ulong)TPrimes.P2, (ulong)TPrimes.P3];

    public static ResidueQuad<TPrimes> Zero => default;

    public bool IsZero => _residues == Vector128<int>.Zero;

    /// <summary>The residues, in the order of <see cref="Primes"/>.</summary>
    public ulong this[int lane] => (ulong)_residues[lane];

    public static ResidueQuad<TPrimes> FromRational(Rational value) =>
        new(Vector128.Create(Reduce(value, TPrimes.P0), Reduce(value, TPrimes.P1), Reduce(value, TPrimes.P2), Reduce(value, TPrimes.P3)));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ResidueQuad<TPrimes> Add(ResidueQuad<TPrimes> a, ResidueQuad<TPrimes> b)
    {
        var p = Vector128.Create(TPrimes.P0, TPrimes.P1, TPrimes.P2, TPrimes.P3);
        var sum = a._residues + b._residues;
        return new(sum - (Vector128.GreaterThanOrEqual(sum, p) & p));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ResidueQuad<TPrimes> Multiply(ResidueQuad<TPrimes> a, ResidueQuad<TPrimes> b) => MultiplyAdd(default, a, b);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ResidueQuad<TPrimes> MultiplyAdd(ResidueQuad<TPrimes> sum, ResidueQuad<TPrimes> a, ResidueQuad<TPrimes> b)
    {
        if (Avx.IsSupported)
        {
            var x = Vector256.FusedMultiplyAdd(
                Avx.ConvertToVector256Double(a._residues),
                Avx.ConvertToVector256Double(b._residues),
                Avx.ConvertToVector256Double(sum._residues));
            var q = Vector256.Floor(x * Reciprocal);
            var r = Vector256.FusedMultiplyAdd(-q, Modulus, x);
            r += Vector256.LessThan(r, Vector256<double>.Zero) & Modulus;
            r -= Vector256.GreaterThanOrEqual(r, Modulus) & Modulus;
            return new(Avx.ConvertToVector128Int32WithTruncation(r));
        }

        return new(Vector128.Create(
            Lane(sum, a, b, 0, TPrimes.P0),
            Lane(sum, a, b, 1, TPrimes.P1),
            Lane(sum, a, b, 2, TPrimes.P2),
            Lane(sum, a, b, 3, TPrimes.P3)));
    }

    private static int Lane(ResidueQuad<TPrimes> sum, ResidueQuad<TPrimes> a, ResidueQuad<TPrimes> b, int lane, int p) =>
        (int)((((long)a._residues[lane] * b._residues[lane]) + sum._residues[lane]) % p);

    // numerator / denominator modulo p; the pass's constants have denominators with only small prime factors.
    private static int Reduce(Rational value, int p)
    {
        var modulus = new BigInteger(p);
        var numerator = ((value.Numerator % modulus) + modulus) % modulus;
        var denominator = value.Denominator % modulus;
        if (denominator.IsZero)
        {
            throw new InvalidOperationException($"The constant {value} has a denominator divisible by the prime {p}.");
        }

        return (int)(numerator * BigInteger.ModPow(denominator, modulus - 2, modulus) % modulus);
    }
}
