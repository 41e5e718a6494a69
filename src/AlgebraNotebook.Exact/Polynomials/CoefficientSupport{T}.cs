using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// The few coefficient-type facts that polynomial parsing, printing and content normalisation need beyond
/// <see cref="IFieldElement{T}"/>: whether the imaginary unit exists, how to split a coefficient into rational
/// components, and how to print one inside a product. Written once here, switched on the coefficient type.
/// </summary>
internal static class CoefficientSupport<T>
    where T : IFieldElement<T>
{
    /// <summary>True when the coefficient field contains i (the Gaussian rationals).</summary>
    public static readonly bool HasImaginaryUnit = typeof(T) == typeof(GaussianRational);

    /// <summary>A short name of the coefficient field for messages.</summary>
    public static string FieldName =>
        typeof(T) == typeof(Rational) ? "Rational" : typeof(T) == typeof(GaussianRational) ? "GaussianRational" : typeof(T).Name;

    /// <summary>The imaginary unit; only valid when <see cref="HasImaginaryUnit"/>.</summary>
    public static T ImaginaryUnit => HasImaginaryUnit
        ? (T)(object)GaussianRational.I
        : throw new InvalidOperationException($"{FieldName} has no imaginary unit.");

    /// <summary>
    /// The rational components of a coefficient (one for Rational, real and imaginary part for GaussianRational),
    /// or null for a coefficient type this helper does not know.
    /// </summary>
    public static Rational[]? RationalParts(T value)
    {
        if (value is Rational r)
        {
            return [r];
        }

        if (value is GaussianRational g)
        {
            return [g.Real, g.Imaginary];
        }

        return null;
    }

    /// <summary>
    /// Size of the largest coefficient of <paramref name="coefficients"/> in bits, numerators and denominators of every
    /// rational component together (so 1 counts 2 bits over Q and 3 over Q(i)); at least 2. For a coefficient type
    /// without rational components (<see cref="RationalParts"/> null) the answer is 2: its size is taken not to grow.
    /// </summary>
    public static long LargestBits(IEnumerable<T> coefficients)
    {
        long largest = 2;
        foreach (var coefficient in coefficients)
        {
            var parts = RationalParts(coefficient);
            if (parts is null)
            {
                return largest;
            }

            long bits = 0;
            foreach (var part in parts)
            {
                // Magnitudes: GetBitLength of a negative number counts two's-complement bits, 0 for -1, so -1/2 would
                // have looked like 1 and (-1/2)^2147483647 would have been admitted as free.
                bits += BigInteger.Abs(part.Numerator).GetBitLength() + part.Denominator.GetBitLength();
            }

            largest = Math.Max(largest, bits);
        }

        return largest;
    }

    /// <summary>Bits of the coefficient 1 as <see cref="LargestBits"/> counts them.</summary>
    public static long OneBits { get; } = LargestBits([T.One]);

    /// <summary>
    /// Splits a coefficient for printing in a sum: <c>Negative</c> says whether to print a minus sign in front of
    /// <c>Magnitude</c>; <c>IsUnit</c> says the magnitude is 1 (and may be left out before a monomial).
    /// Coefficients that are themselves sums (1 - 2*i) come back parenthesised and non-negative.
    /// </summary>
    public static (bool Negative, string Magnitude, bool IsUnit) Split(T value)
    {
        if (value is Rational r)
        {
            return (r.Sign < 0, r.Abs().ToString(), r.Abs().IsOne);
        }

        if (value is GaussianRational g)
        {
            if (g.Imaginary.IsZero)
            {
                return (g.Real.Sign < 0, g.Real.Abs().ToString(), g.Real.Abs().IsOne);
            }

            if (g.Real.IsZero)
            {
                var size = g.Imaginary.Abs();
                return (g.Imaginary.Sign < 0, size.IsOne ? "i" : $"{size}*i", false);
            }

            var imaginary = g.Imaginary.Abs().IsOne ? "i" : $"{g.Imaginary.Abs()}*i";
            return (false, $"({g.Real} {(g.Imaginary.Sign < 0 ? "-" : "+")} {imaginary})", false);
        }

        var text = value.ToString() ?? string.Empty;
        if (value.IsOne)
        {
            return (false, "1", true);
        }

        if ((-value).IsOne)
        {
            return (true, "1", true);
        }

        var compound = text.Length > 1 && (text.IndexOf(" + ", 1, StringComparison.Ordinal) >= 0 || text.IndexOf(" - ", 1, StringComparison.Ordinal) >= 0);
        if (compound)
        {
            return (false, $"({text})", false);
        }

        return text.StartsWith('-') ? (true, text[1..], false) : (false, text, false);
    }

    /// <summary>Converts an integer exponent count to a coefficient.</summary>
    public static T FromInt(int value) => T.FromInteger(new BigInteger(value));
}
