using AlgebraNotebook.Exact.Parsing;

namespace AlgebraNotebook.Exact.Polynomials;

public sealed partial class Polynomial<T>
{
    /// <summary>
    /// Parses polynomial text: sums, products with '*' or by juxtaposition ("3x", "2 hbar t", "1/2 x y^3"),
    /// non-negative integer powers with '^', parentheses, rational or decimal numbers, division by non-zero numbers.
    /// For GaussianRational coefficients the name <c>i</c> is the imaginary unit ("(1 - 2 i) x"); for Rational it is
    /// an error. Names are letters followed by letters, digits or underscores ("xy" is one name; write "x y" or "x*y").
    /// Juxtaposition binds like '*', left to right, so "x/2 y" is (x/2)*y; powers bind tighter than a leading minus
    /// ("-x^2" is -(x^2)); repeated '^' must be parenthesised.
    /// </summary>
    /// <example><c>Polynomial&lt;Rational&gt;.Parse("x^2*y - 2*hbar")</c></example>
    /// <exception cref="ExactParseException">
    /// The text is not a polynomial; <see cref="ExactParseException.Position"/> points at the offending character.
    /// </exception>
    public static Polynomial<T> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return PolynomialParser<T>.ParseAll(text);
    }

    /// <summary>Like <see cref="Parse(string)"/> but returns false instead of throwing.</summary>
    public static bool TryParse(string? text, out Polynomial<T> value)
    {
        value = ZeroInstance;
        if (text is null)
        {
            return false;
        }

        try
        {
            value = Parse(text);
            return true;
        }
        catch (FormatException)
        {
            return false;
        }
    }
}
