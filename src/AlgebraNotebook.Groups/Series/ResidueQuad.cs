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
/// A rational modulo the four primes of <typeparamref name="TPrimes"/>, as balanced residues in [-(p - 1)/2, (p - 1)/2]
/// held in 32-bit lanes. With AVX the four lanes are computed at once in double precision: a product of two residues is
/// below 2^50 in absolute value, so a b + s and sums of up to eight products are exact integers below 2^53, and
/// q = round(x / p) from a rounded reciprocal is off by at most one, which the remainder's size reveals and fixes.
/// Without AVX each lane is computed in 64-bit integers.
/// </summary>
internal readonly struct ResidueQuad<TPrimes> : IPassArithmetic<ResidueQuad<TPrimes>>
    where TPrimes : struct, IPrimeQuad
{
    private static readonly Vector256<double> Modulus = Vector256.Create(TPrimes.P0, TPrimes.P1, TPrimes.P2, (double)TPrimes.P3);

    private static readonly Vector256<double> Reciprocal = Vector256<double>.One / Modulus;

    private static readonly Vector256<double> HalfModulus = Modulus * 0.5;

    private static readonly Vector128<int> IntModulus = Vector128.Create(TPrimes.P0, TPrimes.P1, TPrimes.P2, TPrimes.P3);

    private static readonly Vector128<int> IntHalf = Vector128.Create(TPrimes.P0 / 2, TPrimes.P1 / 2, TPrimes.P2 / 2, TPrimes.P3 / 2);

    private readonly Vector128<int> _residues;

    private ResidueQuad(Vector128<int> residues) => _residues = residues;

    /// <summary>The four primes, in order.</summary>
    public static ulong[] Primes => [(ulong)TPrimes.P0, (ulong)TPrimes.P1, (ulong)TPrimes.P2, (ulong)TPrimes.P3];

    public static ResidueQuad<TPrimes> Zero => default;

    public bool IsZero => _residues == Vector128<int>.Zero;

    /// <summary>The residues in [0, p), in the order of <see cref="Primes"/>.</summary>
    public ulong this[int lane]
    {
        get
        {
            var r = _residues[lane];
            return (ulong)(r < 0 ? r + IntModulus[lane] : r);
        }
    }

    public static ResidueQuad<TPrimes> FromRational(Rational value) =>
        new(Vector128.Create(Reduce(value, TPrimes.P0), Reduce(value, TPrimes.P1), Reduce(value, TPrimes.P2), Reduce(value, TPrimes.P3)));

    /// <summary>The residues of a + b (the tables only multiply and add in one step; this one is for building values).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ResidueQuad<TPrimes> Add(ResidueQuad<TPrimes> a, ResidueQuad<TPrimes> b)
    {
        var sum = a._residues + b._residues;
        sum -= Vector128.GreaterThan(sum, IntHalf) & IntModulus;
        sum += Vector128.LessThan(sum, -IntHalf) & IntModulus;
        return new(sum);
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
            return new(Avx.ConvertToVector128Int32WithTruncation(Balance(x)));
        }

        return new(Vector128.Create(
            Lane(sum._residues[0] + ((long)a._residues[0] * b._residues[0]), TPrimes.P0),
            Lane(sum._residues[1] + ((long)a._residues[1] * b._residues[1]), TPrimes.P1),
            Lane(sum._residues[2] + ((long)a._residues[2] * b._residues[2]), TPrimes.P2),
            Lane(sum._residues[3] + ((long)a._residues[3] * b._residues[3]), TPrimes.P3)));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ResidueQuad<TPrimes> DotProduct(ReadOnlySpan<ResidueQuad<TPrimes>> left, ReadOnlySpan<ResidueQuad<TPrimes>> right)
    {
        if (!Avx.IsSupported)
        {
            var sum = Zero;
            for (var i = 0; i < left.Length; i++)
            {
                sum = MultiplyAdd(sum, left[i], right[i]);
            }

            return sum;
        }

        // Exact in doubles for eight products at a time (each below 2^50, plus a balanced residue below 2^25).
        var total = Vector256<double>.Zero;
        for (var i = 0; i < left.Length; i++)
        {
            total = Vector256.FusedMultiplyAdd(Avx.ConvertToVector256Double(left[i]._residues), Avx.ConvertToVector256Double(right[i]._residues), total);
            if ((i & 7) == 7)
            {
                total = Balance(total);
            }
        }

        return new(Avx.ConvertToVector128Int32WithTruncation(Balance(total)));
    }

    // x - round(x / p) p, corrected into [-(p - 1)/2, (p - 1)/2]; x an integer below 2^53 in absolute value.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector256<double> Balance(Vector256<double> x)
    {
        var q = Vector256.Floor(Vector256.FusedMultiplyAdd(x, Reciprocal, Vector256.Create(0.5)));
        var r = Vector256.FusedMultiplyAdd(-q, Modulus, x);
        r -= Vector256.GreaterThan(r, HalfModulus) & Modulus;
        return r + (Vector256.LessThan(r, -HalfModulus) & Modulus);
    }

    private static int Lane(long value, int p)
    {
        var r = value % p;
        return (int)(r > p / 2 ? r - p : r < -(p / 2) ? r + p : r);
    }

    // numerator / denominator modulo p, balanced; the pass's constants have denominators with only small prime factors.
    private static int Reduce(Rational value, int p)
    {
        var modulus = new BigInteger(p);
        var numerator = ((value.Numerator % modulus) + modulus) % modulus;
        var denominator = value.Denominator % modulus;
        if (denominator.IsZero)
        {
            throw new InvalidOperationException($"The constant {value} has a denominator divisible by the prime {p}.");
        }

        return Lane((long)(numerator * BigInteger.ModPow(denominator, modulus - 2, modulus) % modulus), p);
    }
}
