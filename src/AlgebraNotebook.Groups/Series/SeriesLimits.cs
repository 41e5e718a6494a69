using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// Size cap for the series computations, which work in the free associative algebra truncated after degree N: that
/// algebra has k + k^2 + ... + k^N words on k generators. A request above <see cref="MaxAssociativeWords"/> is refused
/// with a <see cref="BeyondCapabilityException"/> that states the estimated size, instead of running for hours. The
/// two-generator series log(e^X e^Y) by the dual basis or by word coefficients (<see cref="BakerCampbellHausdorffMethod.DualBasis"/>, <see cref="BakerCampbellHausdorffMethod.WordCoefficientRows"/>, <see cref="BakerCampbellHausdorffMethod.WordCoefficients"/>)
/// never forms that algebra; its own cap is the degree <see cref="MaxWordCoefficientDegree"/>.
/// </summary>
public sealed class SeriesLimits
{
    /// <summary>The default cap: 2^18 = 262,144 words (degree 17 on two generators, degree 11 on three).</summary>
    public static SeriesLimits Default { get; } = new(1 << 18);

    /// <summary>
    /// The default degree cap of the word-coefficient methods: 22. Time grows about twofold per degree with the default
    /// dual-basis variant (measured whole runs: degree 22 a few seconds, degree 24 under 20 s) and three- to fivefold
    /// with the row and column variants (row variant: degree 22 74 s of processor time), so degree 24 needs a
    /// <see cref="SeriesLimits"/> with a larger cap.
    /// </summary>
    public const int DefaultMaxWordCoefficientDegree = 22;

    /// <summary>The largest degree the word-coefficient method can handle at all: 26.</summary>
    public const int WordCoefficientDegreeLimit = BinaryLyndonTable.MaxDegree;

    /// <summary>Creates a cap on the associative algebra, with the default degree cap of the word-coefficient method.</summary>
    /// <exception cref="ExactArgumentException">The cap is below 1.</exception>
    public SeriesLimits(long maxAssociativeWords)
        : this(maxAssociativeWords, DefaultMaxWordCoefficientDegree)
    {
    }

    /// <summary>Creates both caps.</summary>
    /// <exception cref="ExactArgumentException">The word cap is below 1, or the degree cap is outside 1..26.</exception>
    public SeriesLimits(long maxAssociativeWords, int maxWordCoefficientDegree)
    {
        if (maxAssociativeWords < 1)
        {
            throw new ExactArgumentException($"The word cap {maxAssociativeWords} must be at least 1.", nameof(maxAssociativeWords));
        }

        if (maxWordCoefficientDegree < 1 || maxWordCoefficientDegree > WordCoefficientDegreeLimit)
        {
            throw new ExactArgumentException(
                $"The degree cap {maxWordCoefficientDegree} of the word-coefficient method must be in 1..{WordCoefficientDegreeLimit}.",
                nameof(maxWordCoefficientDegree));
        }

        MaxAssociativeWords = maxAssociativeWords;
        MaxWordCoefficientDegree = maxWordCoefficientDegree;
    }

    /// <summary>The largest degree accepted by the word-coefficient method for log(e^X e^Y).</summary>
    public int MaxWordCoefficientDegree { get; }

    /// <summary>The largest number of words k + k^2 + ... + k^N accepted.</summary>
    public long MaxAssociativeWords { get; }

    /// <summary>k + k^2 + ... + k^N (saturating at long.MaxValue).</summary>
    public static long AssociativeWords(int generators, int degree)
    {
        long total = 0;
        long power = 1;
        for (var d = 1; d <= degree; d++)
        {
            if (power > long.MaxValue / generators)
            {
                return long.MaxValue;
            }

            power *= generators;
            if (total > long.MaxValue - power)
            {
                return long.MaxValue;
            }

            total += power;
        }

        return total;
    }

    internal void CheckWordCoefficientDegree(string what, int degree)
    {
        if (degree < 1)
        {
            throw new ExactArgumentException($"The degree of the {what} must be at least 1, not {degree}.", nameof(degree));
        }

        if (degree > MaxWordCoefficientDegree)
        {
            throw new BeyondCapabilityException(
                $"The {what} to degree {degree} is above the degree cap {MaxWordCoefficientDegree} of the word-coefficient method " +
                $"(time grows about twofold per degree with the default method, faster with the others; at most {WordCoefficientDegreeLimit} is possible). Lower the degree or pass a SeriesLimits with a larger degree cap.");
        }
    }

    internal void Check(string what, int generators, int degree)
    {
        if (degree < 1)
        {
            throw new ExactArgumentException($"The degree of the {what} must be at least 1, not {degree}.", nameof(degree));
        }

        var words = AssociativeWords(generators, degree);
        if (degree > FreeLie.Word.MaxLength || words > MaxAssociativeWords)
        {
            var size = words == long.MaxValue ? "more than 9.2e18" : words.ToString("N0", System.Globalization.CultureInfo.InvariantCulture);
            throw new BeyondCapabilityException(
                $"The {what} to degree {degree} on {generators} generators needs the free associative algebra truncated at degree {degree}: " +
                $"{size} words, above the cap of {MaxAssociativeWords.ToString("N0", System.Globalization.CultureInfo.InvariantCulture)} words" +
                (degree > FreeLie.Word.MaxLength ? $" (and words are limited to {FreeLie.Word.MaxLength} letters)" : string.Empty) +
                ". Lower the degree or pass a larger SeriesLimits.");
        }
    }
}
