using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Conversion;

/// <summary>Display trees for the exact scalars.</summary>
internal static class ScalarConverters
{
    /// <summary>An integer, or a built-up fraction with the sign in front (−3/4 is "−" followed by the fraction).</summary>
    public static MathNode FromRational(Rational value)
    {
        if (value.IsInteger)
        {
            return MathNodes.Integer(value.Numerator);
        }

        var magnitude = new FractionNode(new NumberNode(System.Numerics.BigInteger.Abs(value.Numerator)), new NumberNode(value.Denominator));
        return value.Sign < 0 ? MathNodes.Negate(magnitude) : magnitude;
    }

    /// <summary>
    /// a + b i with the imaginary unit upright after its coefficient: "1/2 − 3/5 i", "i", "−i", "2 + i"; zero parts
    /// are left out and 0 shows as 0.
    /// </summary>
    public static MathNode FromGaussianRational(GaussianRational value)
    {
        var real = FromRational(value.Real);
        if (value.Imaginary.IsZero)
        {
            return real;
        }

        var imaginary = MathNodes.Product(FromRational(value.Imaginary), MathNodes.ImaginaryUnit);
        return value.Real.IsZero ? imaginary : MathNodes.Sum(real, imaginary);
    }
}
