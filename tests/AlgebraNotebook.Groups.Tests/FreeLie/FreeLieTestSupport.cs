using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Groups.Tests.FreeLie;

/// <summary>Fixed seed, iteration multiplier from ALGEBRANOTEBOOK_TEST_ITERATIONS, and random Lie elements.</summary>
public static class FreeLieTestSupport
{
    /// <summary>The seed every randomised test starts from.</summary>
    public const int Seed = 20261201;

    /// <summary>Base count times ALGEBRANOTEBOOK_TEST_ITERATIONS (default 1).</summary>
    public static int Iterations(int baseCount) => TestIterations.Times(baseCount);

    /// <summary>A random rational with small numerator and denominator (zero allowed).</summary>
    public static Rational SmallRational(Random random) => new(random.Next(-9, 10), random.Next(1, 7));

    /// <summary>A random exact Lie element with a few basis elements of degree 1..maxDegree.</summary>
    public static LieSeries RandomLieElement(FreeLieAlgebra algebra, Random random, int maxDegree, int terms)
    {
        var result = algebra.Zero;
        for (var i = 0; i < terms; i++)
        {
            var degree = random.Next(1, maxDegree + 1);
            var basis = algebra.Basis(degree);
            result += SmallRational(random) * algebra.BasisElement(basis[random.Next(basis.Count)]);
        }

        return result;
    }
}
