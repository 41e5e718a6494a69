using System.Text;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>
/// An ordered set of named generators (letters) for free algebras: the order given is the letter order used by
/// Lyndon words (the first name is the smallest letter). Names are identifiers: a letter followed by letters, digits
/// or underscores. Two alphabets are equal when they list the same names in the same order.
/// </summary>
/// <example><c>new Alphabet("X", "Y")</c> orders X &lt; Y.</example>
public sealed class Alphabet : IEquatable<Alphabet>
{
    private readonly string[] _names;
    private readonly Dictionary<string, int> _indices;

    /// <summary>Creates the alphabet; the order of the arguments is the letter order.</summary>
    /// <exception cref="ExactArgumentException">No names, more than 16, a repeated name, or a name that is not an identifier.</exception>
    public Alphabet(params string[] names)
    {
        ArgumentNullException.ThrowIfNull(names);
        if (names.Length == 0)
        {
            throw new ExactArgumentException("An alphabet needs at least one generator name.", nameof(names));
        }

        if (names.Length > Word.MaxAlphabetSize)
        {
            throw new ExactArgumentException(
                $"An alphabet of {names.Length} generators is beyond the limit of {Word.MaxAlphabetSize} generators.", nameof(names));
        }

        _indices = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var i = 0; i < names.Length; i++)
        {
            var name = names[i];
            if (!IsIdentifier(name))
            {
                throw new ExactArgumentException(
                    $"Generator name \"{name}\" is not an identifier (a letter followed by letters, digits or underscores).", nameof(names));
            }

            if (!_indices.TryAdd(name, i))
            {
                throw new ExactArgumentException($"Generator name \"{name}\" appears twice.", nameof(names));
            }
        }

        _names = (string[])names.Clone();
        AllSingleCharacter = Array.TrueForAll(_names, n => n.Length == 1);
    }

    /// <summary>The generator names, smallest letter first.</summary>
    public IReadOnlyList<string> Names => _names;

    /// <summary>Number of generators.</summary>
    public int Count => _names.Length;

    /// <summary>True when every name is one character, so words can be written without separators ("XXY").</summary>
    internal bool AllSingleCharacter { get; }

    /// <summary>The zero-based letter index of a generator name.</summary>
    /// <exception cref="ExactArgumentException">The name is not in this alphabet; the message lists the alphabet.</exception>
    public int IndexOf(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (_indices.TryGetValue(name, out var index))
        {
            return index;
        }

        throw new ExactArgumentException($"Unknown generator \"{name}\": the generators are {string.Join(", ", _names)}.", nameof(name));
    }

    /// <summary>True when the name is a generator of this alphabet.</summary>
    public bool Contains(string name) => name is not null && _indices.ContainsKey(name);

    /// <summary>The word spelled by generator names, e.g. Spell("X", "X", "Y").</summary>
    /// <exception cref="ExactArgumentException">An unknown name, or more than 32 letters.</exception>
    public Word Spell(params string[] letters)
    {
        ArgumentNullException.ThrowIfNull(letters);
        var indices = new int[letters.Length];
        for (var i = 0; i < letters.Length; i++)
        {
            indices[i] = IndexOf(letters[i]);
        }

        return new Word(indices);
    }

    /// <summary>Writes a word with the generator names: "XXY" when all names are single characters, else "X1*X2*X1".</summary>
    /// <exception cref="ExactArgumentException">The word uses a letter outside this alphabet.</exception>
    public string Format(Word word)
    {
        if (word.IsEmpty)
        {
            return "1";
        }

        var builder = new StringBuilder();
        for (var i = 0; i < word.Length; i++)
        {
            var letter = word.LetterAt(i);
            if (letter >= _names.Length)
            {
                throw new ExactArgumentException($"Word {word} uses letter {letter}, outside the {_names.Length} generators {string.Join(", ", _names)}.", nameof(word));
            }

            if (i > 0 && !AllSingleCharacter)
            {
                builder.Append('*');
            }

            builder.Append(_names[letter]);
        }

        return builder.ToString();
    }

    /// <inheritdoc />
    public bool Equals(Alphabet? other) => other is not null && (ReferenceEquals(this, other) || _names.AsSpan().SequenceEqual(other._names));

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as Alphabet);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var name in _names)
        {
            hash.Add(name, StringComparer.Ordinal);
        }

        return hash.ToHashCode();
    }

    /// <summary>The names in order, e.g. "X &lt; Y".</summary>
    public override string ToString() => string.Join(" < ", _names);

    internal void RequireContains(Word word, string paramName)
    {
        for (var i = 0; i < word.Length; i++)
        {
            if (word.LetterAt(i) >= _names.Length)
            {
                throw new ExactArgumentException(
                    $"Word {word} uses letter {word.LetterAt(i)}, outside the {_names.Length} generators {string.Join(", ", _names)}.", paramName);
            }
        }
    }

    internal static bool IsIdentifier(string? name)
    {
        if (string.IsNullOrEmpty(name) || !char.IsLetter(name[0]))
        {
            return false;
        }

        foreach (var c in name)
        {
            if (!char.IsLetterOrDigit(c) && c != '_')
            {
                return false;
            }
        }

        return true;
    }
}
