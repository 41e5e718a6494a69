using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The arithmetic the table operations of <see cref="PairingTables{T}"/> run in: residues of rationals modulo a few
/// primes (<see cref="ResidueQuad{TPrimes}"/>), or upper bounds on absolute values (<see cref="MagnitudeBound"/>). They
/// only multiply and add, so the same code computes either.
/// </summary>
internal interface IPassArithmetic<T>
    where T : struct, IPassArithmetic<T>
{
    /// <summary>The image of 0.</summary>
    static abstract T Zero { get; }

    /// <summary>The image of a rational constant of the pass (its denominator has only primes below 2^30).</summary>
    static abstract T FromRational(Rational value);

    /// <summary>The image of a b.</summary>
    static abstract T Multiply(T a, T b);

    /// <summary>The image of sum + a b.</summary>
    static abstract T MultiplyAdd(T sum, T a, T b);

    /// <summary>The image of the sum of left[i] right[i] (spans of equal length).</summary>
    static abstract T DotProduct(ReadOnlySpan<T> left, ReadOnlySpan<T> right);

    /// <summary>True for the image of 0 (a zero bound, or all residues zero).</summary>
    bool IsZero { get; }
}
