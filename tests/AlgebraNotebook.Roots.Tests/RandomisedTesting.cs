using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Roots.Tests;

/// <summary>Fixed seed, iteration multiplier from ALGEBRANOTEBOOK_TEST_ITERATIONS, and random weights and words.</summary>
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

    /// <summary>A random weight with labels in -bound..bound.</summary>
    public static Weight RandomWeight(Random random, int rank, int bound = 4)
    {
        var labels = new int[rank];
        for (var i = 0; i < rank; i++)
        {
            labels[i] = random.Next(-bound, bound + 1);
        }

        return new Weight(labels);
    }

    /// <summary>A random word of node numbers 1..rank.</summary>
    public static int[] RandomWord(Random random, int rank, int maxLength)
    {
        var word = new int[random.Next(0, maxLength + 1)];
        for (var k = 0; k < word.Length; k++)
        {
            word[k] = random.Next(1, rank + 1);
        }

        return word;
    }
}
