using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Enveloping;

/// <summary>
/// An element of a universal enveloping algebra U(g): a finite combination of ordered PBW monomials with exact coefficients
/// (see <see cref="UniversalEnvelopingAlgebra{T}"/> for the ordering convention). Sealed, immutable and canonical (no zero
/// coefficients), so equality is mathematical equality within one enveloping algebra.
/// </summary>
/// <typeparam name="T">The field of scalars.</typeparam>
public sealed class EnvelopingElement<T> : IEquatable<EnvelopingElement<T>>
    where T : IFieldElement<T>
{
    private readonly Dictionary<PbwMonomial, T> _terms;
    private (PbwMonomial Monomial, T Coefficient)[]? _sorted;

    internal EnvelopingElement(UniversalEnvelopingAlgebra<T> enveloping, Dictionary<PbwMonomial, T> terms)
    {
        Enveloping = enveloping;
        _terms = terms;
    }

    /// <summary>The enveloping algebra this element belongs to.</summary>
    public UniversalEnvelopingAlgebra<T> Enveloping { get; }

    /// <summary>
    /// The non-zero terms in the printing order of <see cref="PbwMonomial.CompareTo"/>: higher degree first, then
    /// larger exponents of earlier basis elements first.
    /// </summary>
    public IReadOnlyList<(PbwMonomial Monomial, T Coefficient)> Terms =>
        _sorted ??= _terms.Select(kv => (kv.Key, kv.Value)).OrderBy(t => t.Key).ToArray();

    /// <summary>True for the zero element.</summary>
    public bool IsZero => _terms.Count == 0;

    /// <summary>
    /// The filtration degree: the largest total degree of a term (the element lies in U_d(g) for d = Degree and not in
    /// U_(d-1)(g)); -1 for zero.
    /// </summary>
    public int Degree => _terms.Count == 0 ? -1 : _terms.Keys.Max(m => m.Degree);

    /// <summary>The coefficient of the PBW monomial with the given exponents (zero when absent).</summary>
    /// <param name="exponents">One exponent per basis element of g.</param>
    /// <exception cref="ExactArgumentException">Wrong number of exponents.</exception>
    public T Coefficient(params int[] exponents)
    {
        ArgumentNullException.ThrowIfNull(exponents);
        if (exponents.Length != Enveloping.Algebra.Dimension)
        {
            throw new ExactArgumentException(
                $"Expected {Enveloping.Algebra.Dimension} exponents (one per basis element), but {exponents.Length} were given.", nameof(exponents));
        }

        return _terms.TryGetValue(new PbwMonomial(exponents), out var c) ? c : T.Zero;
    }

    /// <summary>The sum of the terms of total degree exactly <paramref name="degree"/> (in the PBW basis).</summary>
    /// <param name="degree">A non-negative degree.</param>
    public EnvelopingElement<T> HomogeneousPart(int degree) =>
        new(Enveloping, _terms.Where(kv => kv.Key.Degree == degree).ToDictionary(kv => kv.Key, kv => kv.Value));

    /// <summary>The sum; both elements must belong to the same enveloping algebra.</summary>
    /// <exception cref="ExactArgumentException">The elements belong to different algebras.</exception>
    public static EnvelopingElement<T> operator +(EnvelopingElement<T> left, EnvelopingElement<T> right)
    {
        Same(left, right);
        var terms = new Dictionary<PbwMonomial, T>(left._terms);
        foreach (var (m, c) in right._terms)
        {
            UniversalEnvelopingAlgebra<T>.AddTo(terms, m, c);
        }

        return new EnvelopingElement<T>(left.Enveloping, terms);
    }

    /// <summary>The difference; both elements must belong to the same enveloping algebra.</summary>
    /// <exception cref="ExactArgumentException">The elements belong to different algebras.</exception>
    public static EnvelopingElement<T> operator -(EnvelopingElement<T> left, EnvelopingElement<T> right)
    {
        Same(left, right);
        return left + (-right);
    }

    /// <summary>The negative.</summary>
    public static EnvelopingElement<T> operator -(EnvelopingElement<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return new EnvelopingElement<T>(value.Enveloping, value._terms.ToDictionary(kv => kv.Key, kv => -kv.Value));
    }

    /// <summary>Scalar multiple.</summary>
    public static EnvelopingElement<T> operator *(T scalar, EnvelopingElement<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return scalar.IsZero
            ? value.Enveloping.Zero
            : new EnvelopingElement<T>(value.Enveloping, value._terms.ToDictionary(kv => kv.Key, kv => scalar * kv.Value));
    }

    /// <summary>Scalar multiple.</summary>
    public static EnvelopingElement<T> operator *(EnvelopingElement<T> value, T scalar) => scalar * value;

    /// <summary>
    /// The product in U(g), normal ordered (e_k e_j = e_j e_k + [e_k, e_j] for k &gt; j). Associative; not commutative.
    /// </summary>
    /// <exception cref="ExactArgumentException">The elements belong to different algebras.</exception>
    public static EnvelopingElement<T> operator *(EnvelopingElement<T> left, EnvelopingElement<T> right)
    {
        Same(left, right);
        var u = left.Enveloping;
        var result = new Dictionary<PbwMonomial, T>();
        foreach (var (rm, rc) in right._terms)
        {
            // left * e_i1 * e_i2 * ... in basis order of the right monomial.
            var current = left._terms;
            var e = rm.ExponentArray;
            for (var i = 0; i < e.Length; i++)
            {
                for (var k = 0; k < e[i]; k++)
                {
                    var next = new Dictionary<PbwMonomial, T>();
                    foreach (var (m, c) in current)
                    {
                        foreach (var (m2, c2) in u.MultiplyByGenerator(m, i))
                        {
                            UniversalEnvelopingAlgebra<T>.AddTo(next, m2, c * c2);
                        }
                    }

                    current = next;
                }
            }

            foreach (var (m, c) in current)
            {
                UniversalEnvelopingAlgebra<T>.AddTo(result, m, c * rc);
            }
        }

        return new EnvelopingElement<T>(u, result);
    }

    /// <summary>The non-negative power (the zeroth power is 1).</summary>
    /// <param name="exponent">A non-negative integer.</param>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    public EnvelopingElement<T> Pow(int exponent)
    {
        if (exponent < 0)
        {
            throw new ExactArgumentException($"The exponent {exponent} is negative; U(g) elements have no inverses here.", nameof(exponent));
        }

        var result = Enveloping.One;
        for (var k = 0; k < exponent; k++)
        {
            result *= this;
        }

        return result;
    }

    /// <summary>The commutator [x, y] = x y - y x in U(g).</summary>
    /// <exception cref="ExactArgumentException">The elements belong to different algebras.</exception>
    public static EnvelopingElement<T> Commutator(EnvelopingElement<T> x, EnvelopingElement<T> y)
    {
        Same(x, y);
        return x * y - y * x;
    }

    /// <inheritdoc/>
    public bool Equals(EnvelopingElement<T>? other)
    {
        if (other is null || !ReferenceEquals(Enveloping, other.Enveloping) || _terms.Count != other._terms.Count)
        {
            return false;
        }

        foreach (var (m, c) in _terms)
        {
            if (!other._terms.TryGetValue(m, out var d) || !c.Equals(d))
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is EnvelopingElement<T> other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var hash = 0;
        foreach (var (m, c) in _terms)
        {
            hash ^= HashCode.Combine(m, c);
        }

        return hash;
    }

    /// <summary>Equality of enveloping algebra and terms.</summary>
    public static bool operator ==(EnvelopingElement<T>? left, EnvelopingElement<T>? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Negation of <c>==</c>.</summary>
    public static bool operator !=(EnvelopingElement<T>? left, EnvelopingElement<T>? right) => !(left == right);

    /// <summary>
    /// Plain text with the basis names, terms in the order of <see cref="Terms"/>, e.g. "H^2 + 2 E F - 2 H + 1/2"; a
    /// monomial's factors are separated by spaces; complex coefficients in parentheses; zero prints as "0".
    /// </summary>
    public override string ToString()
    {
        var names = Enveloping.Algebra.BasisNames;
        var text = new StringBuilder();
        foreach (var (m, c) in Terms)
        {
            var s = c.ToString() ?? string.Empty;
            var negative = s.StartsWith('-') && IsAtomic(s[1..]);
            if (negative)
            {
                s = s[1..];
            }

            text.Append(text.Length == 0 ? (negative ? "-" : string.Empty) : (negative ? " - " : " + "));
            var body = m.Degree == 0 ? string.Empty : m.Format(names);
            var coefficient = IsAtomic(s) ? s.Replace(" ", string.Empty) : $"({s})";
            if (body.Length == 0)
            {
                text.Append(coefficient);
            }
            else
            {
                text.Append(s == "1" ? body : coefficient + " " + body);
            }
        }

        return text.Length == 0 ? "0" : text.ToString();
    }

    private static bool IsAtomic(string s) => s.IndexOfAny(['+', '-']) < 0;

    private static void Same(EnvelopingElement<T> left, EnvelopingElement<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (!ReferenceEquals(left.Enveloping, right.Enveloping))
        {
            throw new ExactArgumentException(
                $"Cannot combine {left} from U({left.Enveloping.Algebra.Label}) with {right} from U({right.Enveloping.Algebra.Label}): they belong to different enveloping algebras.",
                nameof(right));
        }
    }
}
