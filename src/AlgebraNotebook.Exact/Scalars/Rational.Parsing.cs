using System.Globalization;
using System.Numerics;
using AlgebraNotebook.Exact.Parsing;

namespace AlgebraNotebook.Exact.Scalars;

public readonly partial struct Rational
{
    /// <summary>
    /// Parses "3/4", "-7", "+2/6" (reduced to 1/3), or a terminating decimal "0.125" (exactly 1/8).
    /// Surrounding spaces are allowed.
    /// </summary>
    /// <exception cref="ExactParseException">The text is not a rational; the message points at the offending character.</exception>
    /// <exception cref="DivideByZeroException">The denominator is zero.</exception>
    public static Rational Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var position = 0;
        SkipSpaces(text, ref position);
        if (position == text.Length)
        {
            throw new ExactParseException(text, position, "expected a number but the text is empty");
        }

        var value = ParseSignedDecimal(text, ref position, allowSign: true);
        SkipSpaces(text, ref position);
        if (position < text.Length && text[position] == '/')
        {
            position++;
            SkipSpaces(text, ref position);
            var denominatorStart = position;
            var denominator = ParseSignedDecimal(text, ref position, allowSign: false);
            if (denominator.IsZero)
            {
                throw new DivideByZeroException($"Cannot parse \"{text}\": the denominator at position {denominatorStart + 1} is zero.");
            }

            value /= denominator;
            SkipSpaces(text, ref position);
        }

        if (position != text.Length)
        {
            throw new ExactParseException(text, position, $"unexpected character '{text[position]}'");
        }

        return value;
    }

    /// <summary>Like <see cref="Parse(string)"/> but returns false instead of throwing.</summary>
    public static bool TryParse(string? text, out Rational value)
    {
        value = Zero;
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
        catch (DivideByZeroException)
        {
            return false;
        }
    }

    /// <summary>
    /// Reads an unsigned (or, if allowed, signed) integer or terminating decimal starting at <paramref name="position"/>.
    /// Shared with the other parsers of the exact core.
    /// </summary>
    internal static Rational ParseSignedDecimal(string text, ref int position, bool allowSign)
    {
        var negative = false;
        if (allowSign && position < text.Length && (text[position] == '-' || text[position] == '+'))
        {
            negative = text[position] == '-';
            position++;
            SkipSpaces(text, ref position);
        }

        var start = position;
        while (position < text.Length && char.IsAsciiDigit(text[position]))
        {
            position++;
        }

        var integerDigits = text.AsSpan(start, position - start);
        var fractionDigits = ReadOnlySpan<char>.Empty;
        if (position < text.Length && text[position] == '.')
        {
            position++;
            var fractionStart = position;
            while (position < text.Length && char.IsAsciiDigit(text[position]))
            {
                position++;
            }

            fractionDigits = text.AsSpan(fractionStart, position - fractionStart);
            if (integerDigits.IsEmpty && fractionDigits.IsEmpty)
            {
                throw new ExactParseException(text, start, "expected digits around the decimal point");
            }
        }
        else if (integerDigits.IsEmpty)
        {
            var what = position < text.Length ? $"'{text[position]}'" : "the end of the text";
            throw new ExactParseException(text, position, $"expected a digit but found {what}");
        }

        var numerator = BigInteger.Zero;
        if (!integerDigits.IsEmpty)
        {
            numerator = BigInteger.Parse(integerDigits, NumberStyles.None, CultureInfo.InvariantCulture);
        }

        Rational result = numerator;
        if (!fractionDigits.IsEmpty)
        {
            var fraction = BigInteger.Parse(fractionDigits, NumberStyles.None, CultureInfo.InvariantCulture);
            result += new Rational(fraction, BigInteger.Pow(10, fractionDigits.Length));
        }

        return negative ? -result : result;
    }

    internal static void SkipSpaces(string text, ref int position)
    {
        while (position < text.Length && char.IsWhiteSpace(text[position]))
        {
            position++;
        }
    }
}
