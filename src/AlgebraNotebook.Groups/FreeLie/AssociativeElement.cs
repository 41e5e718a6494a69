using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>
/// An element of the free associative algebra over Q on an <see cref="FreeLie.Alphabet"/>: a finite combination of words
/// with <see cref="Rational"/> coefficients, stored sparsely (dictionary keyed by packed <see cref="Word"/>).
/// The product is concatenation of words; the empty word is the unit. Sealed and immutable; zero coefficients are never stored.
/// </summary>
/// <remarks>Terms are listed by degree, then lexicographically. Words have at most <see cref="Word.MaxLength"/> letters.</remarks>
public sealed class AssociativeElement : IEquatable<AssociativeElement>
{
    private readonly Dictionary<Word, Rational> _terms;
    private KeyValuePair<Word, Rational>[]? _sorted;

    internal AssociativeElement(Alphabet alphabet, Dictionary<Word, Rational> terms)
    {
        Alphabet = alphabet;
        _terms = terms;
    }

    /// <summary>The generators.</summary>
    public Alphabet Alphabet { get; }

    /// <summary>The non-zero terms, by degree then lexicographically.</summary>
    public IReadOnlyList<(Word Word, Rational Coefficient)> Terms => Sorted().Select(p => (p.Key, p.Value)).ToArray();

    /// <summary>Number of non-zero terms.</summary>
    public int TermCount => _terms.Count;

    /// <summary>True when there are no terms.</summary>
    public bool IsZero => _terms.Count == 0;

    /// <summary>The largest word length with a non-zero coefficient; -1 for zero.</summary>
    public int MaxDegree => _terms.Count == 0 ? -1 : _terms.Keys.Max(w => w.Length);

    /// <summary>The zero element.</summary>
    public static AssociativeElement Zero(Alphabet alphabet)
    {
        ArgumentNullException.ThrowIfNull(alphabet);
        return new AssociativeElement(alphabet, []);
    }

    /// <summary>The unit (the empty word).</summary>
    public static AssociativeElement One(Alphabet alphabet) => Monomial(alphabet, Word.Empty, Rational.One);

    /// <summary>A generator as an element.</summary>
    /// <exception cref="ExactArgumentException">Unknown generator name.</exception>
    public static AssociativeElement Generator(Alphabet alphabet, string name)
    {
        ArgumentNullException.ThrowIfNull(alphabet);
        return Monomial(alphabet, Word.Letter(alphabet.IndexOf(name)), Rational.One);
    }

    /// <summary>coefficient * word.</summary>
    /// <exception cref="ExactArgumentException">The word uses a letter outside the alphabet.</exception>
    public static AssociativeElement Monomial(Alphabet alphabet, Word word, Rational coefficient)
    {
        ArgumentNullException.ThrowIfNull(alphabet);
        alphabet.RequireContains(word, nameof(word));
        var terms = new Dictionary<Word, Rational>();
        if (!coefficient.IsZero)
        {
            terms[word] = coefficient;
        }

        return new AssociativeElement(alphabet, terms);
    }

    /// <summary>The coefficient of a word (zero when absent).</summary>
    public Rational CoefficientOf(Word word) => _terms.TryGetValue(word, out var c) ? c : Rational.Zero;

    /// <summary>The part of a given degree.</summary>
    public AssociativeElement DegreePart(int degree) =>
        new(Alphabet, _terms.Where(p => p.Key.Length == degree).ToDictionary(p => p.Key, p => p.Value));

    /// <summary>Drops all words longer than <paramref name="maxDegree"/>.</summary>
    /// <exception cref="ExactArgumentException"><paramref name="maxDegree"/> is negative.</exception>
    public AssociativeElement Truncate(int maxDegree)
    {
        if (maxDegree < 0)
        {
            throw new ExactArgumentException($"Truncation degree {maxDegree} is negative.", nameof(maxDegree));
        }

        return new AssociativeElement(Alphabet, _terms.Where(p => p.Key.Length <= maxDegree).ToDictionary(p => p.Key, p => p.Value));
    }

    /// <summary>Sum.</summary>
    /// <exception cref="ExactArgumentException">Different alphabets.</exception>
    public static AssociativeElement operator +(AssociativeElement left, AssociativeElement right) => Combine(left, right, Rational.One);

    /// <summary>Difference.</summary>
    /// <exception cref="ExactArgumentException">Different alphabets.</exception>
    public static AssociativeElement operator -(AssociativeElement left, AssociativeElement right) => Combine(left, right, Rational.MinusOne);

    /// <summary>Negation.</summary>
    public static AssociativeElement operator -(AssociativeElement value) => value.Scale(Rational.MinusOne);

    /// <summary>Scalar multiple.</summary>
    public static AssociativeElement operator *(Rational factor, AssociativeElement value) => value.Scale(factor);

    /// <summary>The product (concatenation, extended bilinearly). Cost: product of the term counts.</summary>
    /// <exception cref="ExactArgumentException">Different alphabets, or a product word longer than 32 letters.</exception>
    public static AssociativeElement operator *(AssociativeElement left, AssociativeElement right) => MultiplyTruncated(left, right, Word.MaxLength);

    /// <summary>The commutator [a, b] = a b - b a.</summary>
    /// <exception cref="ExactArgumentException">Different alphabets, or a product word longer than 32 letters.</exception>
    public static AssociativeElement Commutator(AssociativeElement a, AssociativeElement b) => (a * b) - (b * a);

    /// <summary>The product keeping only words of length at most <paramref name="maxDegree"/> (the others are never formed).</summary>
    /// <exception cref="ExactArgumentException">Different alphabets, or <paramref name="maxDegree"/> outside 0..32.</exception>
    public static AssociativeElement MultiplyTruncated(AssociativeElement left, AssociativeElement right, int maxDegree)
    {
        RequireSameAlphabet(left, right);
        if (maxDegree < 0 || maxDegree > Word.MaxLength)
        {
            throw new ExactArgumentException($"Truncation degree {maxDegree} is outside 0..{Word.MaxLength}.", nameof(maxDegree));
        }

        var result = new Dictionary<Word, Rational>();
        foreach (var (u, a) in left._terms)
        {
            foreach (var (v, b) in right._terms)
            {
                if (u.Length + v.Length > maxDegree)
                {
                    continue;
                }

                AddTo(result, Word.ConcatCore(u, v), a * b);
            }
        }

        return new AssociativeElement(left.Alphabet, result);
    }

    /// <summary>
    /// exp(a) = sum a^m / m! truncated after degree <paramref name="maxDegree"/>, for a without constant term.
    /// </summary>
    /// <exception cref="ExactArgumentException">a has a constant term, or the degree is outside 0..32.</exception>
    public AssociativeElement Exponential(int maxDegree)
    {
        if (!CoefficientOf(Word.Empty).IsZero)
        {
            throw new ExactArgumentException($"exp is taken here only of elements without constant term; this one has constant term {CoefficientOf(Word.Empty)}.", "this");
        }

        var result = One(Alphabet);
        var power = One(Alphabet);
        for (var m = 1; m <= maxDegree; m++)
        {
            power = MultiplyTruncated(power, this, maxDegree).Scale(new Rational(1, m));
            if (power.IsZero)
            {
                break;
            }

            result += power;
        }

        return result;
    }

    /// <summary>
    /// log(a) = sum (-1)^(m+1) (a - 1)^m / m truncated after degree <paramref name="maxDegree"/>, for a with constant term 1.
    /// </summary>
    /// <exception cref="ExactArgumentException">The constant term is not 1, or the degree is outside 0..32.</exception>
    public AssociativeElement Logarithm(int maxDegree)
    {
        if (!CoefficientOf(Word.Empty).IsOne)
        {
            throw new ExactArgumentException($"log is taken here only of elements with constant term 1; this one has constant term {CoefficientOf(Word.Empty)}.", "this");
        }

        var u = this - One(Alphabet);
        var result = Zero(Alphabet);
        var power = One(Alphabet);
        for (var m = 1; m <= maxDegree; m++)
        {
            power = MultiplyTruncated(power, u, maxDegree);
            if (power.IsZero)
            {
                break;
            }

            result += power.Scale(new Rational(m % 2 == 1 ? 1 : -1, m));
        }

        return result;
    }

    /// <summary>This element times a rational factor.</summary>
    public AssociativeElement Scale(Rational factor)
    {
        if (factor.IsZero)
        {
            return Zero(Alphabet);
        }

        return new AssociativeElement(Alphabet, _terms.ToDictionary(p => p.Key, p => p.Value * factor));
    }

    /// <inheritdoc />
    public bool Equals(AssociativeElement? other)
    {
        if (other is null || !Alphabet.Equals(other.Alphabet) || _terms.Count != other._terms.Count)
        {
            return false;
        }

        foreach (var (w, c) in _terms)
        {
            if (!other._terms.TryGetValue(w, out var d) || c != d)
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as AssociativeElement);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = 0;
        foreach (var (w, c) in _terms)
        {
            hash ^= HashCode.Combine(w, c);
        }

        return hash;
    }

    /// <summary>Plain text such as "XY - YX + 1/2 XXY", by degree then lexicographically; "0" for zero.</summary>
    public override string ToString()
    {
        if (_terms.Count == 0)
        {
            return "0";
        }

        var builder = new StringBuilder();
        foreach (var (word, coefficient) in Sorted())
        {
            TermText.Append(builder, coefficient, Alphabet.Format(word), word.IsEmpty);
        }

        return builder.ToString();
    }

    internal Dictionary<Word, Rational> TermsCore => _terms;

    internal static void AddTo(Dictionary<Word, Rational> terms, Word word, Rational value)
    {
        if (value.IsZero)
        {
            return;
        }

        if (terms.TryGetValue(word, out var existing))
        {
            var sum = existing + value;
            if (sum.IsZero)
            {
                terms.Remove(word);
            }
            else
            {
                terms[word] = sum;
            }
        }
        else
        {
            terms[word] = value;
        }
    }

    private static AssociativeElement Combine(AssociativeElement left, AssociativeElement right, Rational sign)
    {
        RequireSameAlphabet(left, right);
        var result = new Dictionary<Word, Rational>(left._terms);
        foreach (var (w, c) in right._terms)
        {
            AddTo(result, w, sign * c);
        }

        return new AssociativeElement(left.Alphabet, result);
    }

    private static void RequireSameAlphabet(AssociativeElement left, AssociativeElement right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (!left.Alphabet.Equals(right.Alphabet))
        {
            throw new ExactArgumentException(
                $"Cannot combine elements over different alphabets ({left.Alphabet}) and ({right.Alphabet}).", nameof(right));
        }
    }

    private KeyValuePair<Word, Rational>[] Sorted() =>
        _sorted ??= _terms.OrderBy(p => p.Key.Length).ThenBy(p => p.Key).ToArray();
}
