using System.Globalization;

namespace AlgebraNotebook.TestSupport;

/// <summary>
/// The iteration multiplier of the randomised tests, read from the environment variable ALGEBRANOTEBOOK_TEST_ITERATIONS:
/// a positive integer multiplies every base count; anything else (unset, empty, zero, negative, not an integer) gives 1.
/// Seeds stay fixed, so a larger multiplier only extends the same streams.
/// </summary>
public static class TestIterations
{
    /// <summary>The name of the environment variable.</summary>
    public const string VariableName = "ALGEBRANOTEBOOK_TEST_ITERATIONS";

    /// <summary>The multiplier from the environment (default 1, at least 1).</summary>
    public static int Multiplier => ParseMultiplier(Environment.GetEnvironmentVariable(VariableName));

    /// <summary>The number of iterations for a test whose base count is <paramref name="baseCount"/>.</summary>
    /// <exception cref="OverflowException">The product exceeds <see cref="int.MaxValue"/>.</exception>
    public static int Times(int baseCount) => checked(baseCount * Multiplier);

    /// <summary>The multiplier a value of the variable stands for: a positive integer as written, otherwise 1.</summary>
    public static int ParseMultiplier(string? text) =>
        int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var value) && value > 0 ? value : 1;
}
