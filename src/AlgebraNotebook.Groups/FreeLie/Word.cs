using System.Runtime.CompilerServices;
using System.Text;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>
/// A word over an ordered alphabet of at most <see cref="MaxAlphabetSize"/> letters, stored packed (4 bits per letter)
/// in a 128-bit integer, so a word has at most <see cref="MaxLength"/> letters. Letters are zero-based indices into the
/// alphabet; letter 0 is the smallest. <c>default(Word)</c> is the empty word.
/// </summary>
/// <remarks>
/// Ordering: lexicographic, a proper prefix before the longer word (X &lt; XY &lt; Y for X &lt; Y), as in the theory of
/// Lyndon words (Lothaire, Combinatorics on Words, chapter 5). Comparison and hashing cost O(1).
/// </remarks>
public readonly struct Word : IEquatable<Word>, IComparable<Word>
{
    /// <summary>Largest number of letters in an alphabet (4 bits per letter).</summary>
    public const int MaxAlphabetSize = 16;

    /// <summary>Largest word length (128 bits / 4 bits per letter).</summary>
    public const int MaxLength = 32;

    private readonly UInt128 _code;
    private readonly int _length;

    private Word(UInt128 code, int length)
    {
        _code = code;
        _length = length;
    }

    /// <summary>Creates a word from zero-based letter indices.</summary>
    /// <exception cref="ExactArgumentException">A letter is outside 0..15 or there are more than 32 letters.</exception>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public Word(ReadOnlySpan<int> letters)
    {
        if (letters.Length > MaxLength)
        {
            throw new ExactArgumentException($"A word of {letters.Length} letters is longer than the limit of {MaxLength} letters.", nameof(letters));
        }

        UInt128 code = 0;
        for (var i = 0; i < letters.Length; i++)
        {
            if ((uint)letters[i] >= MaxAlphabetSize)
            {
                throw new ExactArgumentException($"Letter {letters[i]} at position {i} is outside 0..{MaxAlphabetSize - 1}.", nameof(letters));
            }

            code |= (UInt128)(uint)letters[i] << Shift(i);
        }

        _code = code;
        _length = letters.Length;
    }

    /// <summary>The empty word.</summary>
    public static Word Empty => default;

    /// <summary>Number of letters.</summary>
    public int Length => _length;

    /// <summary>True for the empty word.</summary>
    public bool IsEmpty => _length == 0;

    /// <summary>The zero-based letter index at a position.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The position is outside the word.</exception>
    public int this[int position]
    {
        get
        {
            if ((uint)position >= (uint)_length)
            {
                throw new ArgumentOutOfRangeException(nameof(position), $"Position {position} is outside a word of length {_length}.");
            }

            return LetterAt(position);
        }
    }

    /// <summary>The one-letter word.</summary>
    /// <exception cref="ExactArgumentException">The letter is outside 0..15.</exception>
    public static Word Letter(int letter) => new([letter]);

    /// <summary>The letters as an array of indices.</summary>
    public int[] ToArray()
    {
        var result = new int[_length];
        for (var i = 0; i < _length; i++)
        {
            result[i] = LetterAt(i);
        }

        return result;
    }

    /// <summary>The concatenation <paramref name="left"/><paramref name="right"/>.</summary>
    /// <exception cref="ExactArgumentException">The result would be longer than <see cref="MaxLength"/>.</exception>
    public static Word Concat(Word left, Word right)
    {
        if (left._length + right._length > MaxLength)
        {
            throw new ExactArgumentException(
                $"Concatenating words of lengths {left._length} and {right._length} exceeds the limit of {MaxLength} letters.", nameof(right));
        }

        return ConcatCore(left, right);
    }

    /// <summary>The factor of <paramref name="length"/> letters starting at <paramref name="start"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The range is not inside the word.</exception>
    public Word Subword(int start, int length)
    {
        if (start < 0 || length < 0 || start + length > _length)
        {
            throw new ArgumentOutOfRangeException(nameof(start), $"The range [{start}, {start + length}) is not inside a word of length {_length}.");
        }

        return SubwordCore(start, length);
    }

    /// <summary>Lexicographic comparison; a proper prefix comes first.</summary>
    public int CompareTo(Word other)
    {
        var c = _code.CompareTo(other._code);
        return c != 0 ? c : _length.CompareTo(other._length);
    }

    /// <inheritdoc />
    public bool Equals(Word other) => _code == other._code && _length == other._length;

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Word other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => HashCode.Combine((ulong)(_code >> 64), (ulong)_code, _length);

    /// <summary>Equality.</summary>
    public static bool operator ==(Word left, Word right) => left.Equals(right);

    /// <summary>Inequality.</summary>
    public static bool operator !=(Word left, Word right) => !left.Equals(right);

    /// <summary>Lexicographic order.</summary>
    public static bool operator <(Word left, Word right) => left.CompareTo(right) < 0;

    /// <summary>Lexicographic order.</summary>
    public static bool operator >(Word left, Word right) => left.CompareTo(right) > 0;

    /// <summary>The letters written with a/b/c... for indices 0, 1, 2, ...; "1" for the empty word.</summary>
    public override string ToString()
    {
        if (_length == 0)
        {
            return "1";
        }

        var builder = new StringBuilder(_length);
        for (var i = 0; i < _length; i++)
        {
            builder.Append((char)('a' + LetterAt(i)));
        }

        return builder.ToString();
    }

    internal int LetterAt(int position) => (int)(uint)((_code >> Shift(position)) & 0xF);

    internal static Word ConcatCore(Word left, Word right) =>
        new(left._code | (right._code >> (4 * left._length)), left._length + right._length);

    internal Word SubwordCore(int start, int length)
    {
        if (length == 0)
        {
            return default;
        }

        var shifted = _code << (4 * start);
        var mask = length == MaxLength ? UInt128.MaxValue : ~(UInt128.MaxValue >> (4 * length));
        return new Word(shifted & mask, length);
    }

    /// <summary>Index of this word among the words of its length in lexicographic order (base-k digits).</summary>
    internal int DenseIndex(int alphabetSize)
    {
        var index = 0;
        for (var i = 0; i < _length; i++)
        {
            index = (index * alphabetSize) + LetterAt(i);
        }

        return index;
    }

    /// <summary>The word of a given length whose base-k digits are <paramref name="index"/>.</summary>
    internal static Word FromDenseIndex(int index, int alphabetSize, int length)
    {
        UInt128 code = 0;
        for (var i = length - 1; i >= 0; i--)
        {
            code |= (UInt128)(uint)(index % alphabetSize) << Shift(i);
            index /= alphabetSize;
        }

        return new Word(code, length);
    }

    private static int Shift(int position) => 124 - (4 * position);
}
