using System.Numerics;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>
/// A Lyndon word: a non-empty word strictly smaller (lexicographically, <see cref="Word"/>) than each of its proper
/// non-empty suffixes. The Lyndon words of degree n index a basis of the degree-n part of the free Lie algebra
/// (Lothaire, Combinatorics on Words, chapter 5; Reutenauer, Free Lie Algebras, chapter 5).
/// </summary>
/// <remarks>
/// Standard factorisation: a Lyndon word w of length at least 2 is w = u v with v its longest proper suffix that is a
/// Lyndon word (equivalently its lexicographically smallest proper suffix); then u is Lyndon and u &lt; v. The standard
/// bracketing is P(a) = a for a letter and P(w) = [P(u), P(v)]. Example with X &lt; Y: XYY = (XY)(Y), so
/// P(XYY) = [[X, Y], Y]; XXY = (X)(XY), so P(XXY) = [X, [X, Y]].
/// </remarks>
public readonly struct LyndonWord : IEquatable<LyndonWord>, IComparable<LyndonWord>
{
    private LyndonWord(Word word)
    {
        Word = word;
    }

    /// <summary>The underlying word.</summary>
    public Word Word { get; }

    /// <summary>The length of the word, which is the degree of its basis element.</summary>
    public int Degree => Word.Length;

    /// <summary>True for a one-letter word (a generator).</summary>
    public bool IsLetter => Word.Length == 1;

    /// <summary>Checks and wraps a word.</summary>
    /// <exception cref="ExactArgumentException">The word is empty or not a Lyndon word.</exception>
    public static LyndonWord Create(Word word)
    {
        if (word.Length == 0)
        {
            throw new ExactArgumentException("The empty word is not a Lyndon word; a Lyndon word has at least one letter.", nameof(word));
        }

        if (!IsLyndon(word))
        {
            throw new ExactArgumentException($"The word {word} is not a Lyndon word (it must be non-empty and smaller than each of its proper suffixes).", nameof(word));
        }

        return new LyndonWord(word);
    }

    /// <summary>True when the word is non-empty and strictly smaller than each of its proper suffixes. Cost O(n).</summary>
    public static bool IsLyndon(Word word)
    {
        var n = word.Length;
        if (n == 0)
        {
            return false;
        }

        for (var start = 1; start < n; start++)
        {
            if (word.SubwordCore(start, n - start).CompareTo(word) <= 0)
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>
    /// The standard factorisation (u, v) with v the longest proper Lyndon suffix. Only for degree at least 2.
    /// </summary>
    /// <exception cref="InvalidOperationException">The word is a single letter.</exception>
    public (LyndonWord Left, LyndonWord Right) StandardFactorization()
    {
        if (Degree < 2)
        {
            throw new InvalidOperationException($"The Lyndon word {Word} is a letter and has no standard factorisation.");
        }

        return StandardFactorizationCore(Word);
    }

    internal static (LyndonWord Left, LyndonWord Right) StandardFactorizationCore(Word word)
    {
        // The smallest proper suffix of a Lyndon word is its longest proper Lyndon suffix (Lothaire, Prop. 5.1.3).
        var n = word.Length;
        var best = 1;
        var bestSuffix = word.SubwordCore(1, n - 1);
        for (var start = 2; start < n; start++)
        {
            var suffix = word.SubwordCore(start, n - start);
            if (suffix.CompareTo(bestSuffix) < 0)
            {
                best = start;
                bestSuffix = suffix;
            }
        }

        return (new LyndonWord(word.SubwordCore(0, best)), new LyndonWord(bestSuffix));
    }

    internal static LyndonWord FromTrusted(Word word) => new(word);

    /// <summary>
    /// All Lyndon words of a given length on an alphabet of the given size, in increasing lexicographic order, by
    /// Duval's generation algorithm (J.-P. Duval, Theoret. Comput. Sci. 60 (1988)); amortised O(n) per word.
    /// </summary>
    /// <exception cref="ExactArgumentException">Alphabet size outside 1..16 or degree outside 1..32.</exception>
    public static IEnumerable<LyndonWord> Enumerate(int alphabetSize, int degree)
    {
        if (alphabetSize < 1 || alphabetSize > Word.MaxAlphabetSize)
        {
            throw new ExactArgumentException($"Alphabet size {alphabetSize} is outside 1..{Word.MaxAlphabetSize}.", nameof(alphabetSize));
        }

        if (degree < 1 || degree > Word.MaxLength)
        {
            throw new ExactArgumentException($"Degree {degree} is outside 1..{Word.MaxLength}.", nameof(degree));
        }

        return EnumerateCore(alphabetSize, degree);
    }

    private static IEnumerable<LyndonWord> EnumerateCore(int k, int n)
    {
        var w = new int[n];
        var length = 1;
        w[0] = -1;
        while (length > 0)
        {
            w[length - 1]++;
            var m = length;
            if (m == n)
            {
                yield return new LyndonWord(new Word(w.AsSpan(0, n)));
            }

            while (length < n)
            {
                w[length] = w[length - m];
                length++;
            }

            while (length > 0 && w[length - 1] == k - 1)
            {
                length--;
            }
        }
    }

    /// <summary>
    /// The number of Lyndon words of length n on k letters by Witt's formula (1/n) sum over d | n of mu(d) k^(n/d),
    /// which is the dimension of the degree-n part of the free Lie algebra on k generators.
    /// </summary>
    /// <exception cref="ExactArgumentException">k or n below 1.</exception>
    public static BigInteger CountByWitt(int alphabetSize, int degree)
    {
        if (alphabetSize < 1)
        {
            throw new ExactArgumentException($"Alphabet size {alphabetSize} must be at least 1.", nameof(alphabetSize));
        }

        if (degree < 1)
        {
            throw new ExactArgumentException($"Degree {degree} must be at least 1.", nameof(degree));
        }

        var sum = BigInteger.Zero;
        for (var d = 1; d <= degree; d++)
        {
            if (degree % d == 0)
            {
                var mu = Moebius(d);
                if (mu != 0)
                {
                    sum += mu * BigInteger.Pow(alphabetSize, degree / d);
                }
            }
        }

        return sum / degree;
    }

    /// <summary>The Moebius function mu(n) for n at least 1 (0 when a square divides n).</summary>
    /// <exception cref="ExactArgumentException">n below 1.</exception>
    public static int Moebius(int n)
    {
        if (n < 1)
        {
            throw new ExactArgumentException($"The Moebius function is defined for n >= 1, not {n}.", nameof(n));
        }

        var result = 1;
        for (var p = 2; (long)p * p <= n; p++)
        {
            if (n % p == 0)
            {
                n /= p;
                if (n % p == 0)
                {
                    return 0;
                }

                result = -result;
            }
        }

        return n > 1 ? -result : result;
    }

    /// <inheritdoc />
    public int CompareTo(LyndonWord other) => Word.CompareTo(other.Word);

    /// <inheritdoc />
    public bool Equals(LyndonWord other) => Word.Equals(other.Word);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is LyndonWord other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => Word.GetHashCode();

    /// <summary>Equality.</summary>
    public static bool operator ==(LyndonWord left, LyndonWord right) => left.Equals(right);

    /// <summary>Inequality.</summary>
    public static bool operator !=(LyndonWord left, LyndonWord right) => !left.Equals(right);

    /// <summary>The word with letters a, b, c, ... (use <see cref="Alphabet.Format"/> or <see cref="FreeLieAlgebra"/> for names).</summary>
    public override string ToString() => Word.ToString();
}
