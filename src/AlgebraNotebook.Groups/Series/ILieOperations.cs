using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The operations of a concrete Lie algebra over Q that a free Lie series needs to be evaluated in it: zero,
/// addition, scaling by a rational, and the bracket.
/// </summary>
/// <typeparam name="T">The element type (a matrix, a vector field, ...).</typeparam>
public interface ILieOperations<T>
{
    /// <summary>The zero element (for empty sums).</summary>
    T Zero { get; }

    /// <summary>a + b.</summary>
    T Add(T a, T b);

    /// <summary>factor * a.</summary>
    T Scale(T a, Rational factor);

    /// <summary>The Lie bracket [a, b].</summary>
    T Bracket(T a, T b);
}
