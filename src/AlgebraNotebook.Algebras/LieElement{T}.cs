using System.Text;
using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// An element of a <see cref="LieAlgebra{T}"/>: its coefficients on the algebra's basis. Sealed and immutable.
/// Two elements are equal when they belong to the same algebra instance and have equal coefficients.
/// </summary>
/// <typeparam name="T">The field of scalars.</typeparam>
public sealed class LieElement<T> : IEquatable<LieElement<T>>
    where T : IFieldElement<T>
{
    private readonly T[] _coefficients;

    internal LieElement(LieAlgebra<T> algebra, T[] coefficients)
    {
        Algebra = algebra;
        _coefficients = coefficients;
    }

    /// <summary>The algebra this element belongs to.</summary>
    public LieAlgebra<T> Algebra { get; }

    /// <summary>The coefficients on the basis, in basis order.</summary>
    public IReadOnlyList<T> Coefficients => _coefficients;

    /// <summary>The coefficient of the basis element with the given zero-based index.</summary>
    public T this[int index] => _coefficients[index];

    /// <summary>True for the zero element.</summary>
    public bool IsZero => Vectors<T>.IsZero(_coefficients);

    internal T[] CoefficientArray => _coefficients;

    /// <summary>The sum; both elements must belong to the same algebra.</summary>
    /// <exception cref="ExactArgumentException">The elements belong to different algebras.</exception>
    public static LieElement<T> operator +(LieElement<T> left, LieElement<T> right)
    {
        Same(left, right);
        return new LieElement<T>(left.Algebra, Vectors<T>.Add(left._coefficients, right._coefficients));
    }

    /// <summary>The difference; both elements must belong to the same algebra.</summary>
    /// <exception cref="ExactArgumentException">The elements belong to different algebras.</exception>
    public static LieElement<T> operator -(LieElement<T> left, LieElement<T> right)
    {
        Same(left, right);
        return new LieElement<T>(left.Algebra, Vectors<T>.Subtract(left._coefficients, right._coefficients));
    }

    /// <summary>The negative.</summary>
    public static LieElement<T> operator -(LieElement<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return new LieElement<T>(value.Algebra, Vectors<T>.Scale(-T.One, value._coefficients));
    }

    /// <summary>Scalar multiple.</summary>
    public static LieElement<T> operator *(T scalar, LieElement<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return new LieElement<T>(value.Algebra, Vectors<T>.Scale(scalar, value._coefficients));
    }

    /// <summary>Scalar multiple.</summary>
    public static LieElement<T> operator *(LieElement<T> value, T scalar) => scalar * value;

    /// <summary>The bracket [this, other].</summary>
    /// <exception cref="ExactArgumentException">The elements belong to different algebras.</exception>
    public LieElement<T> Bracket(LieElement<T> other) => Algebra.Bracket(this, other);

    /// <inheritdoc/>
    public bool Equals(LieElement<T>? other) =>
        other is not null && ReferenceEquals(Algebra, other.Algebra) && Vectors<T>.Equal(_coefficients, other._coefficients);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is LieElement<T> other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var c in _coefficients)
        {
            hash.Add(c);
        }

        return hash.ToHashCode();
    }

    /// <summary>Equality of algebra and coefficients.</summary>
    public static bool operator ==(LieElement<T>? left, LieElement<T>? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Negation of <c>==</c>.</summary>
    public static bool operator !=(LieElement<T>? left, LieElement<T>? right) => !(left == right);

    /// <summary>
    /// Plain text as a sum of named basis elements in basis order: "2 H + E - 1/2 F"; complex coefficients in
    /// parentheses, "(1 + i) E"; the zero element prints as "0".
    /// </summary>
    public override string ToString() => Format(Algebra.BasisNames, _coefficients);

    internal static string Format(IReadOnlyList<string> names, T[] coefficients)
    {
        var text = new StringBuilder();
        for (var i = 0; i < coefficients.Length; i++)
        {
            var c = coefficients[i];
            if (c.IsZero)
            {
                continue;
            }

            var s = c.ToString() ?? string.Empty;
            var negative = s.StartsWith('-') && IsAtomic(s[1..]);
            if (negative)
            {
                s = s[1..];
            }

            if (text.Length == 0)
            {
                text.Append(negative ? "-" : string.Empty);
            }
            else
            {
                text.Append(negative ? " - " : " + ");
            }

            if (s != "1")
            {
                // "2 i" prints as "2i"; a coefficient with an inner sign is parenthesised.
                text.Append(IsAtomic(s) ? s.Replace(" ", string.Empty) : $"({s})").Append(' ');
            }

            text.Append(names[i]);
        }

        return text.Length == 0 ? "0" : text.ToString();
    }

    private static bool IsAtomic(string s) => s.IndexOfAny(['+', '-']) < 0;

    private static void Same(LieElement<T> left, LieElement<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (!ReferenceEquals(left.Algebra, right.Algebra))
        {
            throw new ExactArgumentException(
                $"Cannot combine {left} from {left.Algebra.Label} with {right} from {right.Algebra.Label}: they belong to different algebras.",
                nameof(right));
        }
    }
}
