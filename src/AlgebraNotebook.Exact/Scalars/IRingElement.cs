using System.Numerics;

namespace AlgebraNotebook.Exact.Scalars;

/// <summary>
/// An element of a commutative ring with identity, written once so that matrices, polynomials and
/// series work over every scalar type without a copy per type.
/// </summary>
/// <remarks>
/// Contract for implementers: <c>default(T)</c> is the zero element; instances are canonical, so
/// <see cref="IEquatable{T}.Equals(T)"/> is mathematical equality and <see cref="object.GetHashCode"/> agrees with it.
/// Types whose elements carry a context (a truncation order, a set of relations) treat <see cref="Zero"/> and
/// <see cref="One"/> as exact, context-free constants that combine with any context.
/// </remarks>
/// <typeparam name="T">The implementing type itself.</typeparam>
public interface IRingElement<T> :
    IEquatable<T>,
    IAdditionOperators<T, T, T>,
    ISubtractionOperators<T, T, T>,
    IMultiplyOperators<T, T, T>,
    IUnaryNegationOperators<T, T>,
    IEqualityOperators<T, T, bool>
    where T : IRingElement<T>
{
    /// <summary>The additive identity; equal to <c>default(T)</c>.</summary>
    static abstract T Zero { get; }

    /// <summary>The multiplicative identity.</summary>
    static abstract T One { get; }

    /// <summary>The image of an integer under the unique ring map from the integers.</summary>
    static abstract T FromInteger(BigInteger value);

    /// <summary>True when this element is zero.</summary>
    bool IsZero { get; }

    /// <summary>True when this element is one.</summary>
    bool IsOne { get; }

    /// <summary>
    /// Complex conjugate. Real types return the element itself; polynomial types conjugate their coefficients
    /// and treat their variables as real (the convention used for conjugate transposes).
    /// </summary>
    T Conjugate();
}

/// <summary>
/// A ring that contains the rationals (a Q-algebra): division by non-zero integers is possible, which
/// exponentials, logarithms and the Baker-Campbell-Hausdorff series need.
/// </summary>
/// <typeparam name="T">The implementing type itself.</typeparam>
public interface IRationalAlgebraElement<T> : IRingElement<T>
    where T : IRationalAlgebraElement<T>
{
    /// <summary>The image of a rational number.</summary>
    static abstract T FromRational(Rational value);

    /// <summary>This element multiplied by a rational factor.</summary>
    T Scale(Rational factor);
}

/// <summary>A field of characteristic zero (here: the rationals, the Gaussian rationals).</summary>
/// <typeparam name="T">The implementing type itself.</typeparam>
public interface IFieldElement<T> : IRationalAlgebraElement<T>, IDivisionOperators<T, T, T>
    where T : IFieldElement<T>
{
    /// <summary>The multiplicative inverse. Throws <see cref="DivideByZeroException"/> for zero.</summary>
    T Reciprocal();
}

/// <summary>
/// An integral domain with exact division, as fraction-free (Bareiss) elimination needs.
/// </summary>
/// <typeparam name="T">The implementing type itself.</typeparam>
public interface IExactDivision<T> : IRingElement<T>
    where T : IExactDivision<T>
{
    /// <summary>
    /// Returns q with <c>dividend == q * divisor</c>, or false when no such q exists (or the divisor is zero).
    /// </summary>
    static abstract bool TryDivideExact(T dividend, T divisor, out T quotient);
}
