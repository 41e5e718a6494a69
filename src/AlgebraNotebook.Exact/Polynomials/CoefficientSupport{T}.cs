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
