using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// An element of a <see cref="QuotientRing{T}"/>: a class of polynomials modulo the relations, stored as its normal
/// form <see cref="Representative"/>. A readonly struct, so <c>default</c> is the context-free zero.
/// </summary>
/// <remarks>
/// <para><see cref="Zero"/>, <see cref="One"/>, <see cref="FromInteger"/> and <see cref="FromRational"/> give
/// context-free constants (<see cref="Ring"/> is null) that combine with elements of any ring; constants are normal
/// forms in every consistent quotient ring. Arithmetic between elements of two different ring instances throws
/// <see cref="ExactArgumentException"/>.</para>
/// <para>Equality compares normal forms. Elements of two different rings are never equal (so a context-free constant
/// equals the same constant in each ring, but those two are not equal to each other); the hash code depends only on
/// the representative.</para>
/// </remarks>
/// <typeparam name="T">The coefficient field.</typeparam>
public readonly struct QuotientElement<T> :
    IRationalAlgebraElement<QuotientElement<T>>
    where T : IFieldElement<T>
{
    private readonly Polynomial<T>? _representative;

    internal QuotientElement(QuotientRing<T>? ring, Polynomial<T> normalForm)
    {
        Ring = ring;
        _representative = normalForm.IsZero ? null : normalForm;
    }

    /// <summary>The ring the element belongs to; null for the context-free constants.</summary>
    public QuotientRing<T>? Ring { get; }

    /// <summary>The normal form: the canonical polynomial representing this element.</summary>
    public Polynomial<T> Representative => _representative ?? Polynomial<T>.Zero;

    /// <inheritdoc />
    public static QuotientElement<T> Zero => default;

    /// <inheritdoc />
    public static QuotientElement<T> One => new(null, Polynomial<T>.One);

    /// <inheritdoc />
    public bool IsZero => _representative is null;

    /// <inheritdoc />
    public bool IsOne => _representative is not null && _representative.IsOne;

    /// <inheritdoc />
    public static QuotientElement<T> FromInteger(BigInteger value) => new(null, Polynomial<T>.FromInteger(value));

    /// <inheritdoc />
    public static QuotientElement<T> FromRational(Rational value) => new(null, Polynomial<T>.FromRational(value));

    /// <summary>A context-free constant element.</summary>
    public static QuotientElement<T> Constant(T value) => new(null, Polynomial<T>.Constant(value));

    /// <inheritdoc />
    public QuotientElement<T> Scale(Rational factor) => new(Ring, Representative.Scale(factor));

    /// <summary>
    /// Conjugates the coefficients (variables are real) and reduces. Defined when the ideal is closed under
    /// conjugation, as it is for relations with real coefficients.
    /// </summary>
    /// <exception cref="ExactArgumentException">The ring's relations are not closed under conjugation.</exception>
    public QuotientElement<T> Conjugate()
    {
        if (Ring is null)
        {
            return new(null, Representative.Conjugate());
        }

        if (!Ring.IsClosedUnderConjugation)
        {
            throw new ExactArgumentException(
                $"Conjugation is not defined in {Ring}: the conjugated relations generate a different ideal.", "this");
        }

        return new(Ring, Ring.Reduce(Representative.Conjugate()));
    }

    /// <summary>The element to a non-negative integer power, reducing after each multiplication.</summary>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    public QuotientElement<T> Pow(int exponent)
    {
        if (exponent < 0)
        {
            throw new ExactArgumentException($"Exponent {exponent} is negative; only non-negative powers of {this} are defined.", nameof(exponent));
        }

        return Powers.BySquaring(new QuotientElement<T>(Ring, Polynomial<T>.One), this, exponent);
    }

    /// <inheritdoc />
    public static QuotientElement<T> operator +(QuotientElement<T> left, QuotientElement<T> right) =>
        new(CommonRing(left, right, "add"), left.Representative + right.Representative); // sums of normal forms are normal

    /// <inheritdoc />
    public static QuotientElement<T> operator -(QuotientElement<T> left, QuotientElement<T> right) =>
        new(CommonRing(left, right, "subtract"), left.Representative - right.Representative);

    /// <inheritdoc />
    public static QuotientElement<T> operator -(QuotientElement<T> value) => new(value.Ring, -value.Representative);

    /// <inheritdoc />
    public static QuotientElement<T> operator *(QuotientElement<T> left, QuotientElement<T> right)
    {
        var ring = CommonRing(left, right, "multiply");
        var product = left.Representative * right.Representative;
        return new(ring, ring is null ? product : ring.Reduce(product));
    }

    /// <inheritdoc />
    public bool Equals(QuotientElement<T> other)
    {
        if (Ring is not null && other.Ring is not null && !ReferenceEquals(Ring, other.Ring))
        {
            return false;
        }

        return Representative.Equals(other.Representative);
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is QuotientElement<T> other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => Representative.GetHashCode();

    /// <inheritdoc />
    public static bool operator ==(QuotientElement<T> left, QuotientElement<T> right) => left.Equals(right);

    /// <inheritdoc />
    public static bool operator !=(QuotientElement<T> left, QuotientElement<T> right) => !left.Equals(right);

    /// <summary>The representative as plain text.</summary>
    public override string ToString() => Representative.ToString();

    private static QuotientRing<T>? CommonRing(QuotientElement<T> left, QuotientElement<T> right, string operation)
    {
        if (left.Ring is null)
        {
            return right.Ring;
        }

        if (right.Ring is null || ReferenceEquals(left.Ring, right.Ring))
        {
            return left.Ring;
        }

        throw new ExactArgumentException(
            $"Cannot {operation} {left} and {right}: they belong to different quotient rings, {left.Ring} and {right.Ring}.",
            nameof(right));
    }
}
