using CsCheck;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Reliability.Tests.Properties;

/// <summary>
/// Runs a property over values drawn from a CsCheck generator with a fixed seed, so every run (and every machine)
/// checks the same inputs. The number of iterations is a base count times ALGEBRANOTEBOOK_TEST_ITERATIONS (default 1).
/// A failure names the iteration, the seed and stream, and prints the input, which can then be kept as a regression case.
/// </summary>
public static class PropertyCheck
{
    /// <summary>The seed every property starts from.</summary>
    public const ulong Seed = 20261201;

    /// <summary>The multiplier read from ALGEBRANOTEBOOK_TEST_ITERATIONS (default 1, at least 1).</summary>
    public static int Multiplier => TestIterations.Multiplier;

    /// <summary>The number of iterations for a property whose base count is <paramref name="baseCount"/>.</summary>
    public static int Iterations(int baseCount) => TestIterations.Times(baseCount);

    /// <summary>
    /// Checks <paramref name="property"/> on <see cref="Iterations"/>(<paramref name="baseIterations"/>) values of
    /// <paramref name="generator"/>, drawn from the fixed seed on stream <paramref name="stream"/> (one stream per property).
    /// </summary>
    /// <returns>The number of inputs checked.</returns>
    public static int ForAll<T>(Gen<T> generator, int baseIterations, uint stream, Action<T> property, Func<T, string> describe)
    {
        var pcg = new PCG(stream, Seed);
        var count = Iterations(baseIterations);
        for (var i = 0; i < count; i++)
        {
            var value = generator.Generate(pcg, null, out _);
            try
            {
                property(value);
            }
            catch (Exception e)
            {
                Assert.Fail($"Property failed at iteration {i} (seed {Seed}, stream {stream}) for the input\n{describe(value)}\n{e.GetType().Name}: {e.Message}");
            }
        }

        return count;
    }
}
