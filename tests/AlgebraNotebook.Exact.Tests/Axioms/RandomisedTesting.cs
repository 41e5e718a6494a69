using System.Numerics;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Exact.Tests.Axioms;

/// <summary>Fixed seed, iteration multiplier from ALGEBRANOTEBOOK_TEST_ITERATIONS, and shared random scalars.</summary>
public static class RandomisedTesting
{
    /// <summary>The seed every randomised test starts from.</summary>
    public const int Seed = 20261201;

    /// <summary>The multiplier read from ALGEBRANOTEBOOK_TEST_ITERATIONS (default 1, at least 1).</summary>
    public static int Multiplier => TestIterations.Multiplier;

    /// <summary>The number of iterations for a test whose base count is <paramref name="baseCount"/>.</summary>
    public static int Iterations(int baseCount) => TestIterations.Times(baseCount);

    /// <summary>A fresh generator with the fixed seed (offset so different tests do not replay one stream).</summary>
    public static Random NewRandom(int offset = 0) => new(Seed + offset);

    /// <summary>A random integer: mostly small, sometimes zero, sometimes far beyond 64 bits.</summary>
    public static BigInteger Integer(Random random)
    {
        switch (random.Next(10))
        {
            case 0:
                return BigInteger.Zero;
            case 1:
            {
                var bytes = new byte[random.Next(9, 20)];
                random.NextBytes(bytes);
                return new BigInteger(bytes);
            }

            default:
                return random.Next(-30, 31);
        }
    }

    /// <summary>A random rational with small or huge numerator and denominator.</summary>
    public static Rational Rational(Random random)
    {
        var numerator = Integer(random);
        BigInteger denominator;
        do
        {
            denominator = random.Next(5) == 0 ? Integer(random) : random.Next(1, 25);
        }
        while (denominator.IsZero);

        return new Rational(numerator, denominator);
    }

    /// <summary>A random Gaussian rational (sometimes real, sometimes purely imaginary).</summary>
    public static GaussianRational GaussianRational(Random random) => random.Next(6) switch
    {
        0 => new GaussianRational(Rational(random), Exact.Scalars.Rational.Zero),
        1 => new GaussianRational(Exact.Scalars.Rational.Zero, Rational(random)),
        _ => new GaussianRational(Rational(random), Rational(random)),
    };
}
